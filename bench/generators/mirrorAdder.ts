// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * The 28-transistor mirror full adder and ripple-carry adders built from it.
 *
 * Topology after Weste & Harris, "CMOS VLSI Design", 4th ed. (2011), §11.2.1, fig. 11.4 (from
 * memory): a 10-transistor carry stage producing !Cout, a 14-transistor sum stage producing !S from
 * !Cout, each with a pull-up network that mirrors its pull-down network, and two output inverters.
 * Widths are ours (NMOS 1 µm, PMOS 2 µm throughout), not the figure's.
 */
import type { Device, Netlist } from '../../src/core/model/netlist.ts';
import { GND, NMOS_W, PMOS_W, VDD, assemble, cellDevices, inverter, numbered } from './parts.ts';

export interface FullAdderNets {
  readonly a: string;
  readonly b: string;
  readonly ci: string;
  readonly sum: string;
  readonly co: string;
}

/**
 * !Cout = !(A·B + Ci·(A + B)). The majority function is self-dual, so the pull-up network has the same
 * shape as the pull-down network: (A ∥ B) in series with Ci, in parallel with A in series with B.
 */
function carryStage(p: string, n: FullAdderNets, cob: string): readonly Device[] {
  const { a, b, ci } = n;
  const w = { n: NMOS_W, p: PMOS_W };
  return cellDevices((c) =>
    c
      .pmos(`${p}MP1`, { g: a, d: `${p}p1`, s: VDD, w: w.p })
      .pmos(`${p}MP2`, { g: b, d: `${p}p1`, s: VDD, w: w.p })
      .pmos(`${p}MP3`, { g: ci, d: cob, s: `${p}p1`, w: w.p })
      .pmos(`${p}MP4`, { g: a, d: `${p}p2`, s: VDD, w: w.p })
      .pmos(`${p}MP5`, { g: b, d: cob, s: `${p}p2`, w: w.p })
      .nmos(`${p}MN1`, { g: a, d: `${p}n1`, s: GND, w: w.n })
      .nmos(`${p}MN2`, { g: b, d: `${p}n1`, s: GND, w: w.n })
      .nmos(`${p}MN3`, { g: ci, d: cob, s: `${p}n1`, w: w.n })
      .nmos(`${p}MN4`, { g: a, d: `${p}n2`, s: GND, w: w.n })
      .nmos(`${p}MN5`, { g: b, d: cob, s: `${p}n2`, w: w.n }),
  );
}

/** !S = !(A·B·Ci + (A + B + Ci)·!Cout), again with mirrored pull-up and pull-down networks. */
function sumStage(p: string, n: FullAdderNets, cob: string, sb: string): readonly Device[] {
  const { a, b, ci } = n;
  const w = { n: NMOS_W, p: PMOS_W };
  return cellDevices((c) =>
    c
      .pmos(`${p}MP6`, { g: a, d: `${p}p3`, s: VDD, w: w.p })
      .pmos(`${p}MP7`, { g: b, d: `${p}p3`, s: VDD, w: w.p })
      .pmos(`${p}MP8`, { g: ci, d: `${p}p3`, s: VDD, w: w.p })
      .pmos(`${p}MP9`, { g: cob, d: sb, s: `${p}p3`, w: w.p })
      .pmos(`${p}MP10`, { g: a, d: `${p}p4`, s: VDD, w: w.p })
      .pmos(`${p}MP11`, { g: b, d: `${p}p5`, s: `${p}p4`, w: w.p })
      .pmos(`${p}MP12`, { g: ci, d: sb, s: `${p}p5`, w: w.p })
      .nmos(`${p}MN6`, { g: a, d: `${p}n3`, s: GND, w: w.n })
      .nmos(`${p}MN7`, { g: b, d: `${p}n3`, s: GND, w: w.n })
      .nmos(`${p}MN8`, { g: ci, d: `${p}n3`, s: GND, w: w.n })
      .nmos(`${p}MN9`, { g: cob, d: sb, s: `${p}n3`, w: w.n })
      .nmos(`${p}MN10`, { g: a, d: `${p}n4`, s: GND, w: w.n })
      .nmos(`${p}MN11`, { g: b, d: `${p}n5`, s: `${p}n4`, w: w.n })
      .nmos(`${p}MN12`, { g: ci, d: sb, s: `${p}n5`, w: w.n }),
  );
}

/** One mirror full adder; devices and internal nets are prefixed with `prefix` (e.g. "FA3."). */
export function mirrorFullAdder(prefix: string, nets: FullAdderNets): readonly Device[] {
  const cob = `${prefix}cob`;
  const sb = `${prefix}sb`;
  return [
    ...carryStage(prefix, nets, cob),
    ...sumStage(prefix, nets, cob, sb),
    ...inverter(`${prefix}IC`, cob, nets.co),
    ...inverter(`${prefix}IS`, sb, nets.sum),
  ];
}

export interface RippleAdderOptions {
  /** Net names are `${prefix}A0`, `${prefix}S0`, …; devices `${prefix}FA0.MP1`, …. Default ''. */
  readonly prefix?: string;
  /** Operand nets, least significant first; default `${prefix}A0…` and `${prefix}B0…`. */
  readonly a?: readonly string[];
  readonly b?: readonly string[];
  /** The carry-in net; default the input `${prefix}CI`. Pass 'GND' to tie it low. */
  readonly carryIn?: string;
}

/** The devices and pin names of an n-bit ripple-carry adder, ready to be assembled or combined. */
export function rippleAdderDevices(
  bits: number,
  options: RippleAdderOptions = {},
): { devices: readonly Device[]; a: string[]; b: string[]; carryIn: string; sum: string[]; co: string } {
  if (!Number.isInteger(bits) || bits < 1)
    throw new RangeError(`bits must be a positive integer, got ${bits}`);
  const p = options.prefix ?? '';
  const a = [...(options.a ?? numbered(`${p}A`, bits))];
  const b = [...(options.b ?? numbered(`${p}B`, bits))];
  if (a.length !== bits || b.length !== bits) throw new RangeError(`operands must have ${bits} nets each`);
  const carryIn = options.carryIn ?? `${p}CI`;
  const sum = numbered(`${p}S`, bits);
  const co = `${p}CO`;
  const carry = (i: number): string => (i === 0 ? carryIn : i === bits ? co : `${p}c${i}`);
  const devices = sum.flatMap((s, i) =>
    mirrorFullAdder(`${p}FA${i}.`, { a: a[i]!, b: b[i]!, ci: carry(i), sum: s, co: carry(i + 1) }),
  );
  return { devices, a, b, carryIn, sum, co };
}

/** An n-bit ripple-carry adder: inputs A0…, B0…, CI (least significant first), outputs S0…, CO. */
export function rippleAdder(bits: number): Netlist {
  const adder = rippleAdderDevices(bits);
  const inputs = [...adder.a, ...adder.b, adder.carryIn];
  return assemble(`ripple-adder-${bits}`, { inputs, outputs: [...adder.sum, adder.co] }, [adder.devices]);
}
