import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { InputValue, InputVector } from '../../src/core/model/design.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { autoPlace } from '../../src/core/sheet/autoPlace.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { LiveSession } from '../../src/core/view/liveSession.ts';
import { overlayPaint, paintLayout, type OverlayPaint } from '../../src/core/view/overlayPaint.ts';
import { bindPaint, paintSolved, repaintSolved } from '../../src/core/view/paintSolved.ts';
import { solvedView } from '../../src/core/view/solvedView.ts';
import { muxTree, ratioedDecoder, rippleAdder } from '../../bench/generators/index.ts';
import { passNetwork, randomNetlist } from '../property/generators.ts';

// Internal consistency, no outside source: a toggle's paint, made from the previous vector's paint,
// must equal the whole paint of the new vector read by name (overlayPaint over solvedView), and its
// change lists must name exactly the nets and devices whose look, mark or state differs.

/** How often each kind of change was met over the whole run, so the walks are known to reach them. */
const met = { badge: 0, floating: 0, unknown: 0, degraded: 0, maybe: 0 };

const BADGES = /[∿‖⚔◌▽⇋]/;

function tally(
  before: OverlayPaint,
  after: OverlayPaint,
  nets: readonly number[],
  devices: readonly number[],
) {
  for (const i of nets) {
    const [a, b] = [before.nets[i], after.nets[i]];
    const looks = [a?.look, b?.look];
    if (BADGES.test(a?.text ?? '') !== BADGES.test(b?.text ?? '')) met.badge++;
    if (looks.includes('floating')) met.floating++;
    if (looks.includes('unknown')) met.unknown++;
    if (looks.some((l) => l?.startsWith('degraded'))) met.degraded++;
  }
  for (const j of devices) if ([before.conduction[j], after.conduction[j]].includes('maybe')) met.maybe++;
}

/** Indices where two lists differ by value (look and text, or state), found the slow way. */
function differing<T>(a: readonly T[], b: readonly T[]): number[] {
  return a.flatMap((x, i) => (JSON.stringify(x) === JSON.stringify(b[i]) ? [] : [i]));
}

/** Walks the vectors as the app does (each solved from the last; sometimes from an unknown state). */
function checkWalk(netlist: Netlist, rows: readonly (readonly InputValue[])[], resets: readonly boolean[]) {
  const sheet = autoPlace(netlist);
  const derived = sheetToNetlist(sheet, netlist.name);
  const layout = paintLayout(sheet, derived);
  const session = new LiveSession(derived.netlist, DEFAULT_TECHNOLOGY);
  const binding = bindPaint(layout, session.compiled);
  const inputs = derived.netlist.inputs;
  let paint: OverlayPaint | null = null;
  rows.forEach((row, s) => {
    const vector: InputVector = Object.fromEntries(inputs.map((n, i) => [n, row[i % row.length]!]));
    if (resets[s % resets.length]) session.reset();
    const result = session.solve(vector);
    const view = solvedView(session.compiled, result);
    const whole = overlayPaint(layout, view.net, view.device);
    expect(paintSolved(binding, result)).toEqual(whole);
    if (paint !== null) {
      const step = repaintSolved(binding, paint, result);
      expect(step.paint).toEqual(whole);
      expect(step.nets).toEqual(differing(paint.nets, whole.nets));
      expect(step.devices).toEqual(differing(paint.conduction, whole.conduction));
      tally(paint, whole, step.nets, step.devices);
    }
    paint = whole;
  });
}

const value = fc.constantFrom<InputValue>('0', '1', '0', '1', '0', '1', 'X', 'Z');
const rows = (width: number) =>
  fc.array(fc.array(value, { minLength: width, maxLength: width }), { minLength: 2, maxLength: 10 });
const reset = fc.oneof(
  { weight: 3, arbitrary: fc.constant(false) },
  { weight: 1, arbitrary: fc.constant(true) },
);
const resets = fc.array(reset, { minLength: 1, maxLength: 4 });

describe('a toggle repaints from the previous paint', () => {
  it('on bench-like cells: a ripple adder, a transmission-gate mux tree, a ratioed decoder', () => {
    const cells = [rippleAdder(3), muxTree(2), ratioedDecoder(2)];
    fc.assert(
      fc.property(fc.constantFrom(...cells), rows(7), resets, (netlist, r, z) => checkWalk(netlist, r, z)),
      { numRuns: 30 },
    );
  });

  it('on the starter cells and on random circuits, pass networks included', () => {
    const netlists = fc.oneof(
      fc.constantFrom(...STARTERS.map((s) => s.design.netlist)),
      randomNetlist(),
      passNetwork(),
    );
    fc.assert(
      fc.property(netlists, rows(3), resets, (netlist, r, z) => checkWalk(netlist, r, z)),
      { numRuns: 150 },
    );
  });

  // Runs after the two above (tests in a file run in order).
  it('met every kind of change: badges coming and going, Z, X, degraded levels, maybe devices', () => {
    for (const [kind, count] of Object.entries(met)) expect(count, kind).toBeGreaterThan(0);
  });
});
