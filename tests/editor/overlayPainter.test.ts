// What the overlay draws into an area: behaviour of our own drawing; no source applies.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { InputVector } from '../../src/core/model/design.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { autoPlace } from '../../src/core/sheet/autoPlace.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { LiveSession } from '../../src/core/view/liveSession.ts';
import { paintLayout } from '../../src/core/view/overlayPaint.ts';
import { bindPaint, paintSolved } from '../../src/core/view/paintSolved.ts';
import { paintNear, paintOverlay, type LevelScene } from '../../src/editor/overlay/overlayPainter.ts';
import { rippleAdder } from '../../bench/generators/index.ts';

/** A context that writes down every drawing call with its arguments (styles included). */
function recorder(): { ctx: CanvasRenderingContext2D; calls: string[] } {
  const calls: string[] = [];
  const ctx = new Proxy(
    {},
    {
      get:
        (_t, k) =>
        (...args: unknown[]) =>
          void calls.push(`${String(k)}(${args.join(',')})`),
      set: (_t, k, v) => (calls.push(`${String(k)}=${String(v)}`), true),
    },
  );
  return { ctx: ctx as CanvasRenderingContext2D, calls };
}

const netlist = rippleAdder(3);
const sheet = autoPlace(netlist);
const derived = sheetToNetlist(sheet, netlist.name);
const layout = paintLayout(sheet, derived);
const session = new LiveSession(derived.netlist, DEFAULT_TECHNOLOGY);
const vector: InputVector = Object.fromEntries(
  derived.netlist.inputs.map((n, i) => [n, i % 3 === 0 ? '1' : '0']),
);
const scene: LevelScene = {
  layout,
  paint: paintSolved(bindPaint(layout, session.compiled), session.solve(vector)),
};

describe('painting an area of the overlay', () => {
  // The placed 3-bit adder reaches about x = -10…216, y = -18…18.
  const across = fc.integer({ min: -10, max: 220 });
  const down = fc.integer({ min: -20, max: 20 });
  it('draws through the tiles exactly what walking every shape draws', () => {
    fc.assert(
      fc.property(
        across,
        down,
        fc.integer({ min: 1, max: 40 }),
        fc.constantFrom(4, 10, 30),
        (x, y, w, scale) => {
          const area = { x0: x, y0: y, x1: x + w, y1: y + w / 2 };
          const tiled = recorder();
          const walked = recorder();
          paintOverlay(tiled.ctx, area, scale, scene);
          paintNear(walked.ctx, area, scale, { ...scene, near: null });
          expect(tiled.calls).toEqual(walked.calls);
        },
      ),
      { numRuns: 80 },
    );
  });

  it('draws level strokes, transistor marks and level marks somewhere on the sheet', () => {
    const { ctx, calls } = recorder();
    paintOverlay(ctx, { x0: -1e4, y0: -1e4, x1: 1e4, y1: 1e4 }, 30, scene);
    for (const call of ['stroke()', 'arc(', 'fillText('])
      expect(calls.some((c) => c.startsWith(call))).toBe(true);
  });
});
