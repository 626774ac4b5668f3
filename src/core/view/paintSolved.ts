// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
/**
 * The overlay's paint read straight from the solver's arrays, and a toggle's paint made from the
 * previous one: only the drawn nets whose look or mark changed, and the transistors whose state
 * changed, get new entries. A net's paint depends on its level and flags alone, so it is looked up
 * in a table of shared objects and compared by identity; the whole comparison is a pass over two
 * typed arrays (a few microseconds on a 5,000-transistor sheet), cheaper than anything it could skip.
 * The result equals `overlayPaint` over `solvedView` of the same vector (tests/view/paintSolved.property.test.ts).
 */
import type { CompiledNetlist } from '../compile/compile.ts';
import { netPaint, type NetPaint, type OverlayPaint, type PaintLayout } from './overlayPaint.ts';
import { conductionName, elementsByName, stateOfCodes, type SolvedArrays } from './solvedView.ts';
import type { Conduction } from './visualLanguage.ts';
import { MAYBE, OFF, ON } from '../solver/levels.ts';

/** A layout tied to a compiled netlist: which solver net and element each drawn net and device is. */
export interface PaintBinding {
  readonly layout: PaintLayout;
  readonly compiled: CompiledNetlist;
  /** Solver net of each layout net, -1 when the netlist has no such net. */
  readonly netOf: Int32Array;
  /** Channel element of each layout device, -1 when the netlist has no such device. */
  readonly elementOf: Int32Array;
}

/** What a toggle changed on screen: the new paint and the layout nets and devices it changed. */
export interface PaintChange {
  readonly paint: OverlayPaint;
  readonly nets: readonly number[];
  readonly devices: readonly number[];
}

const bindings = new WeakMap<PaintLayout, PaintBinding>();

/** The binding of a layout to a compiled netlist, kept while both stay the same. */
export function bindPaint(layout: PaintLayout, compiled: CompiledNetlist): PaintBinding {
  const held = bindings.get(layout);
  if (held !== undefined && held.compiled === compiled) return held;
  const elements = elementsByName(compiled);
  const binding: PaintBinding = {
    layout,
    compiled,
    netOf: Int32Array.from(layout.nets, (name) => compiled.netIndex.get(name) ?? -1),
    elementOf: Int32Array.from(layout.devices, (d) => elements.get(d.name) ?? -1),
  };
  bindings.set(layout, binding);
  return binding;
}

/** Paint per level code and flags (index level | flags << 2), filled as codes are met; dense, so fast. */
const byCode: (NetPaint | null)[] = new Array<NetPaint | null>(4 << 8).fill(null);
const CONDUCTION: readonly Conduction[] = [OFF, ON, MAYBE].map(conductionName);

function paintOfNet(result: SolvedArrays, net: number): NetPaint | null {
  if (net < 0) return null;
  const level = result.levels[net]!;
  const flags = result.flags[net]!;
  const code = level | (flags << 2);
  return (byCode[code] ??= netPaint(stateOfCodes(level, flags, null)));
}

function stateOfElement(result: SolvedArrays, element: number): Conduction | undefined {
  return element < 0 ? undefined : CONDUCTION[result.conduction[element]!];
}

/** A whole vector's paint from the solver's arrays. */
export function paintSolved(binding: PaintBinding, result: SolvedArrays): OverlayPaint {
  return {
    nets: Array.from(binding.netOf, (n) => paintOfNet(result, n)),
    conduction: Array.from(binding.elementOf, (e) => stateOfElement(result, e)),
  };
}

/** `before` with entry i, for i below `count`, made `now(i)` where they differ: copied only then. */
function patched<T>(
  before: readonly T[],
  count: number,
  now: (i: number) => T,
): { list: readonly T[]; changed: number[] } {
  let list: T[] | null = null;
  const changed: number[] = [];
  for (let i = 0; i < count; i++) {
    const value = now(i);
    if (value === before[i]) continue;
    (list ??= before.slice())[i] = value;
    changed.push(i);
  }
  return { list: list ?? before, changed };
}

/**
 * The paint of `result` made from `before`, the paint of the vector shown until now on the same
 * binding: entries that did not change are kept, and the change lists name those that did.
 */
export function repaintSolved(
  binding: PaintBinding,
  before: OverlayPaint,
  result: SolvedArrays,
): PaintChange {
  const { netOf, elementOf } = binding;
  const nets = patched(before.nets, netOf.length, (i) => paintOfNet(result, netOf[i]!));
  const devices = patched(before.conduction, elementOf.length, (j) => stateOfElement(result, elementOf[j]!));
  return {
    paint: { nets: nets.list, conduction: devices.list },
    nets: nets.changed,
    devices: devices.changed,
  };
}
