import { describe, expect, it } from 'vitest';
import { autoPlace } from '../../src/core/sheet/autoPlace.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { LiveSession } from '../../src/core/view/liveSession.ts';
import { solvedView } from '../../src/core/view/solvedView.ts';
import {
  overlayPaint,
  paintedDevices,
  paintedMarks,
  paintLayout,
  strokesByLook,
} from '../../src/core/view/overlayPaint.ts';
import { inverter, nand2MissingPullUp } from '../cells.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import type { InputVector } from '../../src/core/model/design.ts';

/** Draws a netlist the way the editor does, solves one vector, and paints it. */
function painted(netlist: Netlist, vector: InputVector) {
  const sheet = autoPlace(netlist);
  const derived = sheetToNetlist(sheet, netlist.name);
  const session = new LiveSession(derived.netlist, DEFAULT_TECHNOLOGY);
  const view = solvedView(session.compiled, session.solve(vector));
  const layout = paintLayout(sheet, derived);
  const solved = overlayPaint(
    layout,
    (n) => view.net(n),
    (d) => view.device(d),
  );
  const paint = {
    strokes: strokesByLook(layout, solved),
    marks: paintedMarks(layout, solved),
    devices: paintedDevices(layout, solved),
  };
  const pointsOf = (look: string) => (paint.strokes.get(look as never) ?? []).length;
  return { paint, pointsOf, derived, sheet };
}

describe('overlay paint', () => {
  // CMOS inverter with A = 1: the NMOS conducts, the PMOS is off, Y is low (common practice, no source).
  it('paints an inverter at A = 1: input high, output low, NMOS on, PMOS off', () => {
    const { paint, pointsOf, derived } = painted(inverter, { A: '1' });
    expect(pointsOf('high')).toBeGreaterThan(0);
    expect(pointsOf('low')).toBeGreaterThan(0);
    expect(pointsOf('floating')).toBe(0);
    expect(paint.devices.map((d) => d.conduction).sort()).toEqual(['off', 'on']);
    const nmosPart = Object.entries(derived.partDevices).find(([, name]) => name === 'N1')?.[0];
    expect(nmosPart).toBeDefined();
    expect(paint.marks.some((m) => m.text === '0' && m.look === 'low')).toBe(true);
  });

  it('marks a floating output with the floating look and its badge', () => {
    const { paint, pointsOf } = painted(nand2MissingPullUp, { A: '1', B: '0' });
    expect(pointsOf('floating')).toBeGreaterThan(0);
    expect(paint.marks.some((m) => m.look === 'floating' && m.text === 'Z ◌')).toBe(true);
  });

  it('paints every level stroke in one list per look, whatever the sheet size', () => {
    const { paint } = painted(inverter, { A: '0' });
    expect([...paint.strokes.keys()].sort()).toEqual(['high', 'low']);
  });
});
