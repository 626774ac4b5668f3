import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { InputVector } from '../../src/core/model/design.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import type { Rect } from '../../src/core/sheet/geometry.ts';
import { autoPlace } from '../../src/core/sheet/autoPlace.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { LiveSession } from '../../src/core/view/liveSession.ts';
import { paintLayout } from '../../src/core/view/overlayPaint.ts';
import { changedAreas } from '../../src/core/view/paintAreas.ts';
import { bindPaint, paintSolved, repaintSolved } from '../../src/core/view/paintSolved.ts';
import { deviceBox, markBox, PAINT_TILE, segmentBox, shapesIn } from '../../src/core/view/paintTiles.ts';
import { rippleAdder } from '../../bench/generators/index.ts';

// Geometry of our own layout, no outside source: what a painted area must contain.

const netlist = rippleAdder(3);
const sheet = autoPlace(netlist);
const derived = sheetToNetlist(sheet, netlist.name);
const layout = paintLayout(sheet, derived);

const overlaps = (a: Rect, b: Rect): boolean => a.x0 <= b.x1 && b.x0 <= a.x1 && a.y0 <= b.y1 && b.y0 <= a.y1;
const inside = (p: { x: number; y: number }, r: Rect): boolean =>
  p.x >= r.x0 && p.x <= r.x1 && p.y >= r.y0 && p.y <= r.y1;
const corners = (b: Rect) => [
  { x: b.x0, y: b.y0 },
  { x: b.x1, y: b.y1 },
  { x: (b.x0 + b.x1) / 2, y: (b.y0 + b.y1) / 2 },
];

describe('the layout filed by tiles', () => {
  // The placed 3-bit adder reaches about x = -10…216, y = -18…18.
  const area = fc.tuple(
    fc.integer({ min: -10, max: 220 }),
    fc.integer({ min: -20, max: 20 }),
    fc.integer({ min: 0, max: 30 }),
    fc.integer({ min: 0, max: 30 }),
  );
  it('finds every segment, mark and transistor mark whose box meets an area, each once, in order', () => {
    fc.assert(
      fc.property(area, ([x, y, w, h]) => {
        const a = { x0: x, y0: y, x1: x + w, y1: y + h };
        const near = shapesIn(layout, a);
        if (near === null) return;
        const wanted = <T>(list: readonly T[], box: (t: T) => Rect) =>
          list.flatMap((t, i) => (overlaps(box(t), a) ? [i] : []));
        const within = <T>(found: readonly number[], list: readonly T[], box: (t: T) => Rect) => {
          expect(found).toEqual([...new Set(found)].sort((p, q) => p - q));
          for (const i of wanted(list, box)) expect(found).toContain(i);
        };
        within(near.segments, layout.segments, (s) => segmentBox(s.points));
        within(near.marks, layout.marks, markBox);
        within(near.devices, layout.devices, deviceBox);
      }),
      { numRuns: 100 },
    );
  });

  it('gives no list for an area wider than the sheet (walking everything is cheaper)', () => {
    expect(shapesIn(layout, { x0: -1e4, y0: -1e4, x1: 1e4, y1: 1e4 })).toBeNull();
  });
});

describe('the areas a toggle repaints', () => {
  const session = new LiveSession(derived.netlist, DEFAULT_TECHNOLOGY);
  const binding = bindPaint(layout, session.compiled);
  const inputs = derived.netlist.inputs;
  const vector = fc.array(fc.constantFrom('0', '1'), { minLength: inputs.length, maxLength: inputs.length });

  it('cover every changed segment, mark and transistor mark, in whole tiles', () => {
    const first: InputVector = Object.fromEntries(inputs.map((n) => [n, '0']));
    let paint = paintSolved(binding, session.solve(first));
    fc.assert(
      fc.property(vector, (levels) => {
        const result = session.solve(Object.fromEntries(inputs.map((n, i) => [n, levels[i]!])));
        const step = repaintSolved(binding, paint, result);
        paint = step.paint;
        const areas = changedAreas(layout, step);
        const changed = new Set(step.nets);
        const boxes = [
          ...layout.segments.filter((s) => changed.has(s.net)).map((s) => segmentBox(s.points)),
          ...layout.marks.filter((m) => changed.has(m.net)).map(markBox),
          ...step.devices.map((j) => deviceBox(layout.devices[j]!)),
        ];
        for (const box of boxes)
          for (const p of corners(box)) expect(areas.some((a) => inside(p, a))).toBe(true);
        for (const a of areas) {
          expect(Number.isInteger(a.x0 / PAINT_TILE) && Number.isInteger(a.x1 / PAINT_TILE)).toBe(true);
          expect(a.y1 - a.y0).toBe(PAINT_TILE);
        }
        if (boxes.length === 0) expect(areas).toEqual([]);
      }),
      { numRuns: 60 },
    );
  });
});

describe('a long wire', () => {
  it('is found by any area its box meets, though it is filed in no tile', () => {
    // A bus with a corner whose box spans 100 × 100 tiles: every query reads it.
    const bus = { net: 0, points: [0, 0, 800, 0, 800, 800] };
    const long = { ...layout, segments: [...layout.segments, bus] };
    const found = shapesIn(long, { x0: 400, y0: 300, x1: 410, y1: 310 });
    expect(found?.segments).toContain(layout.segments.length);
  });
});
