// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * The solver's typed arrays turned into what the sheet overlay and the net list draw: a state per
 * net name, an on/off/maybe mark per device, and each static current path as named nets and devices.
 */
import type { CompiledNetlist } from '../compile/compile.ts';
import {
  FLAG_CHARGE_SHARED,
  FLAG_CONTENTION,
  FLAG_DEGRADED,
  FLAG_MAYBE,
  FLAG_OSCILLATING,
  FLAG_STATES,
  MAYBE,
  ON,
  levelName,
} from '../solver/levels.ts';
import type { Conduction, NetState } from './visualLanguage.ts';

/** The part of the solver's SolveResult the views read (kept structural so views stay decoupled). */
export interface SolvedArrays {
  readonly volts: Float64Array;
  readonly levels: Uint8Array;
  readonly flags: Uint8Array;
  readonly conduction: Uint8Array;
  readonly paths: readonly {
    readonly elements: readonly number[];
    readonly nets: readonly number[];
    readonly current: number;
  }[];
  readonly supplyCurrent: number;
  readonly staticPower: number;
}

export interface CurrentTrace {
  readonly nets: readonly string[];
  readonly devices: readonly string[];
  /** Source net, device, net, …, device, sink net. */
  readonly chain: readonly string[];
  readonly current: number;
}

/**
 * The solved state of every net and device, read by name. Built lazily: a toggle on a 5,000-transistor
 * sheet pays only for the nets the overlay and panels actually read, each once.
 */
export interface SolvedView {
  /** What the view reads, for code that works by index (the overlay's paint, paintSolved.ts). */
  readonly compiled: CompiledNetlist;
  readonly result: SolvedArrays;
  readonly netNames: readonly string[];
  net(name: string): NetState | undefined;
  device(name: string): Conduction | undefined;
  readonly traces: readonly CurrentTrace[];
  readonly supplyCurrent: number;
  readonly staticPower: number;
}

export function netState(result: SolvedArrays, net: number): NetState {
  const volts = result.volts[net]!;
  return stateOfCodes(result.levels[net]!, result.flags[net]!, Number.isNaN(volts) ? null : volts);
}

/** A net's state from its solver codes: level (LEVEL_*) and flags (FLAG_* bits). */
export function stateOfCodes(level: number, flags: number, volts: number | null): NetState {
  return {
    level: levelName(level),
    volts,
    degraded: (flags & FLAG_DEGRADED) !== 0,
    contention: (flags & FLAG_CONTENTION) !== 0,
    chargeShared: (flags & FLAG_CHARGE_SHARED) !== 0,
    oscillating: (flags & FLAG_OSCILLATING) !== 0,
    stored: (flags & FLAG_STATES) !== 0,
    maybe: (flags & FLAG_MAYBE) !== 0,
  };
}

export function conductionName(code: number): Conduction {
  return code === ON ? 'on' : code === MAYBE ? 'maybe' : 'off';
}

function deviceName(compiled: CompiledNetlist, element: number): string {
  return compiled.netlist.devices[compiled.chDevice[element]!]!.name;
}

/** Interleaves a path's nets and elements; a path with one net more than elements is the usual case. */
export function traceOf(compiled: CompiledNetlist, path: SolvedArrays['paths'][number]): CurrentTrace {
  const nets = path.nets.map((n) => compiled.netNames[n]!);
  const devices = path.elements.map((e) => deviceName(compiled, e));
  const chain: string[] = [];
  nets.forEach((net, i) => {
    chain.push(net);
    if (i < devices.length) chain.push(devices[i]!);
  });
  return { nets, devices, chain, current: path.current };
}

/** Channel element of each device name, built once per compiled netlist (not per vector). */
const elementIndex = new WeakMap<CompiledNetlist, Map<string, number>>();

export function elementsByName(compiled: CompiledNetlist): Map<string, number> {
  let index = elementIndex.get(compiled);
  if (index === undefined) {
    index = new Map(Array.from({ length: compiled.chCount }, (_, e) => [deviceName(compiled, e), e]));
    elementIndex.set(compiled, index);
  }
  return index;
}

export function solvedView(compiled: CompiledNetlist, result: SolvedArrays): SolvedView {
  const cache = new Map<number, NetState>();
  return {
    compiled,
    result,
    netNames: compiled.netNames,
    net(name) {
      const n = compiled.netIndex.get(name);
      if (n === undefined) return undefined;
      let state = cache.get(n);
      if (state === undefined) cache.set(n, (state = netState(result, n)));
      return state;
    },
    device(name) {
      const e = elementsByName(compiled).get(name);
      return e === undefined ? undefined : conductionName(result.conduction[e]!);
    },
    traces: result.paths.map((p) => traceOf(compiled, p)),
    supplyCurrent: result.supplyCurrent,
    staticPower: result.staticPower,
  };
}
