/**
 * Shared pieces for the benchmark's circuit generators.
 *
 * Each cell instance is drawn with the core builder on its own small circuit and its devices are
 * then concatenated. Chaining thousands of devices onto one builder would copy the device list on
 * every call (the builder is immutable), which turns a 20,000-transistor circuit into seconds of
 * setup; cell-sized builders keep generation linear in the circuit size.
 */
import { circuit, type CircuitBuilder } from '../../src/core/model/builder.ts';
import type { Device, Netlist } from '../../src/core/model/netlist.ts';

export const VDD = 'VDD';
export const GND = 'GND';

/** Widths in µm: PMOS twice the NMOS, the usual first cut for equal rise and fall (common practice, no source). */
export const NMOS_W = 1;
export const PMOS_W = 2;

/** The devices one cell-sized builder drew. */
export function cellDevices(draw: (b: CircuitBuilder) => CircuitBuilder): readonly Device[] {
  return draw(circuit('cell')).build().devices;
}

/** A static CMOS inverter from `a` to `y`, devices named `${prefix}P` and `${prefix}N`. */
export function inverter(prefix: string, a: string, y: string): readonly Device[] {
  return cellDevices((b) =>
    b
      .pmos(`${prefix}P`, { g: a, d: y, s: VDD, w: PMOS_W })
      .nmos(`${prefix}N`, { g: a, d: y, s: GND, w: NMOS_W }),
  );
}

/**
 * A transmission gate between `a` and `b` that conducts when `on` is 1 (and `onBar` is 0):
 * NMOS gated by `on`, PMOS by `onBar`.
 */
export function transmissionGate(
  prefix: string,
  a: string,
  b: string,
  on: string,
  onBar: string,
): readonly Device[] {
  return cellDevices((c) =>
    c
      .nmos(`${prefix}N`, { g: on, d: a, s: b, w: NMOS_W })
      .pmos(`${prefix}P`, { g: onBar, d: a, s: b, w: PMOS_W }),
  );
}

export interface Pins {
  readonly inputs: readonly string[];
  readonly outputs: readonly string[];
}

/** A netlist with VDD and GND rails, the given pins, and the cells' devices in order. */
export function assemble(name: string, pins: Pins, cells: readonly (readonly Device[])[]): Netlist {
  const frame = circuit(name)
    .rails()
    .input(...pins.inputs)
    .output(...pins.outputs)
    .build();
  return { ...frame, devices: cells.flat() };
}

/** `${stem}0` … `${stem}${count - 1}`. */
export function numbered(stem: string, count: number): string[] {
  return Array.from({ length: count }, (_, i) => `${stem}${i}`);
}

/** Number of MOS transistors in a netlist (resistors, capacitors and diodes are not counted). */
export function transistorCount(netlist: Netlist): number {
  return netlist.devices.filter((d) => d.kind === 'nmos' || d.kind === 'pmos').length;
}
