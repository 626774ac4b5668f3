// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import type { Netlist } from '../model/netlist.ts';
import { netNames } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import { netCapacitances } from './capacitance.ts';
import { csrFrom, type Csr } from './csr.ts';

/** Channel element kinds in the compiled form. */
export const NMOS = 0;
export const PMOS = 1;
export const RESISTOR = 2;

/**
 * The index-based form the solver runs on, built once per edit. Nets and channel elements
 * (transistors and resistors) are numbered; everything the hot loop reads is a typed array.
 */
export interface CompiledNetlist {
  readonly netlist: Netlist;
  readonly tech: Technology;
  readonly netCount: number;
  readonly netNames: readonly string[];
  readonly netIndex: ReadonlyMap<string, number>;
  /** Rail voltage per net, NaN for nets that are not rails. */
  readonly railVolts: Float64Array;
  readonly inputNets: Int32Array;
  readonly outputNets: Int32Array;
  /** Channel elements: transistors and resistors. */
  readonly chCount: number;
  readonly chKind: Uint8Array;
  /** Gate net per element, -1 for resistors. */
  readonly chGate: Int32Array;
  readonly chA: Int32Array;
  readonly chB: Int32Array;
  /** On-resistance, ohms: R_unit · L / W for transistors. */
  readonly chOhms: Float64Array;
  /** Index into netlist.devices. */
  readonly chDevice: Int32Array;
  /** Channel elements touching each net (by drain/source or resistor end). */
  readonly netChannels: Csr;
  /** Channel elements whose gate is each net. */
  readonly netGates: Csr;
  /** Capacitance of each net to ground, farads. */
  readonly netCap: Float64Array;
}

export class CompileError extends Error {
  override readonly name = 'CompileError';
}

function onResistance(kind: 'nmos' | 'pmos', w: number, l: number, tech: Technology): number {
  return (kind === 'nmos' ? tech.rn : tech.rp) * (l / w);
}

export function compile(netlist: Netlist, tech: Technology): CompiledNetlist {
  const names = netNames(netlist);
  const netIndex = new Map(names.map((n, i) => [n, i]));
  const idx = (n: string): number => netIndex.get(n) as number;
  const netCount = names.length;

  const railVolts = new Float64Array(netCount).fill(NaN);
  for (const r of netlist.rails) {
    railVolts[idx(r.net)] = r.role === 'ground' ? 0 : (r.volts ?? tech.vdd);
  }
  for (const inp of netlist.inputs) {
    if (!Number.isNaN(railVolts[idx(inp)])) throw new CompileError(`input ${inp} is also a rail`);
  }

  const channelDevices: number[] = [];
  netlist.devices.forEach((d, i) => {
    if (d.kind === 'nmos' || d.kind === 'pmos' || d.kind === 'resistor') channelDevices.push(i);
  });
  const chCount = channelDevices.length;
  const chKind = new Uint8Array(chCount);
  const chGate = new Int32Array(chCount).fill(-1);
  const chA = new Int32Array(chCount);
  const chB = new Int32Array(chCount);
  const chOhms = new Float64Array(chCount);
  const chDevice = Int32Array.from(channelDevices);
  channelDevices.forEach((di, c) => {
    const d = netlist.devices[di]!;
    if (d.kind === 'resistor') {
      chKind[c] = RESISTOR;
      chA[c] = idx(d.a);
      chB[c] = idx(d.b);
      chOhms[c] = d.ohms;
    } else if (d.kind === 'nmos' || d.kind === 'pmos') {
      chKind[c] = d.kind === 'nmos' ? NMOS : PMOS;
      chGate[c] = idx(d.gate);
      chA[c] = idx(d.drain);
      chB[c] = idx(d.source);
      chOhms[c] = onResistance(d.kind, d.w, d.l, tech);
    }
  });

  // Adjacency lists: each element under both channel ends (once if they are the same net), and
  // under its gate.
  const channelRows: number[] = [];
  const channelItems: number[] = [];
  const gateRows: number[] = [];
  const gateItems: number[] = [];
  for (let c = 0; c < chCount; c++) {
    channelRows.push(chA[c]!);
    channelItems.push(c);
    if (chB[c] !== chA[c]) {
      channelRows.push(chB[c]!);
      channelItems.push(c);
    }
    if (chGate[c]! >= 0) {
      gateRows.push(chGate[c]!);
      gateItems.push(c);
    }
  }

  return {
    netlist,
    tech,
    netCount,
    netNames: names,
    netIndex,
    railVolts,
    inputNets: Int32Array.from(netlist.inputs.map(idx)),
    outputNets: Int32Array.from(netlist.outputs.map(idx)),
    chCount,
    chKind,
    chGate,
    chA,
    chB,
    chOhms,
    chDevice,
    netChannels: csrFrom(netCount, channelRows, channelItems),
    netGates: csrFrom(netCount, gateRows, gateItems),
    netCap: netCapacitances(netlist, tech, netIndex),
  };
}
