import { describe, expect, it } from 'vitest';
import { headlessEditor } from './headless.ts';
import { inverter } from '../cells.ts';

/**
 * Drawing the static CMOS inverter the way a new user would: number keys to place parts, drags
 * from pin to pin to wire. The expected topology is common practice, no source.
 */
describe('drawing an inverter with the headless editor', () => {
  function drawInverter() {
    const ed = headlessEditor();
    ed.key('2'); // PMOS
    ed.click(0, -3);
    ed.key('1'); // NMOS
    ed.click(0, 3);
    ed.key('5'); // VDD on the PMOS source
    ed.click(0, -5);
    ed.key('6'); // GND on the NMOS source
    ed.click(0, 5);
    ed.key('7'); // input pin A
    ed.click(-6, 0);
    ed.key('8'); // output pin Y
    ed.click(4, 0);
    ed.drag({ x: 0, y: -1 }, { x: 0, y: 1 }); // drain to drain
    ed.drag({ x: 4, y: 0 }, { x: 0, y: 0 }); // output onto the drain wire
    ed.drag({ x: -2, y: -3 }, { x: -2, y: 3 }); // gate to gate
    ed.drag({ x: -6, y: 0 }, { x: -2, y: 0 }); // input onto the gate wire
    return ed;
  }

  it('derives the inverter netlist', () => {
    const ed = drawInverter();
    const expected = { ...inverter, name: 'untitled' };
    expect(ed.state().design.netlist).toEqual(expected);
    expect(ed.state().doc.sheet.wires).toHaveLength(4);
  });

  it('undoes each step back to the empty sheet and redoes them all', () => {
    const ed = drawInverter();
    const finished = ed.state().doc;
    let steps = 0;
    while (ed.state().history.past.length > 0) {
      ed.key('z', { ctrl: true });
      steps++;
    }
    // Six placements and four wires: ten steps, one each.
    expect(steps).toBe(10);
    expect(ed.state().doc.sheet.parts).toHaveLength(0);
    for (let i = 0; i < steps; i++) ed.key('z', { ctrl: true, shift: true });
    expect(ed.state().doc).toEqual(finished);
  });

  it('Escape drops a wire being drawn and the sheet is unchanged', () => {
    const ed = drawInverter();
    const before = ed.state().doc;
    ed.down(0, -5); // VDD pin: starts a wire
    ed.up(0, -5);
    ed.move(3, -7);
    expect(ed.state().gesture?.type).toBe('wiring');
    ed.key('Escape');
    expect(ed.state().gesture).toBeNull();
    expect(ed.state().doc).toBe(before);
    expect(ed.ctl.describe()).toBe('select:idle');
  });

  it('click-by-click wiring bends at each click and ends on a pin', () => {
    const ed = headlessEditor();
    ed.key('1');
    ed.click(0, 0);
    ed.key('9'); // a net label
    ed.click(6, 4);
    ed.click(0, -2); // start on the drain
    ed.click(3, -4); // bend
    ed.click(6, 4); // end on the label's pin
    const wire = ed.state().doc.sheet.wires[0]!;
    expect(wire.points[0]).toEqual({ x: 0, y: -2 });
    expect(wire.points[wire.points.length - 1]).toEqual({ x: 6, y: 4 });
    expect(ed.state().design.netlist.devices[0]).toMatchObject({ drain: 'net1' });
    expect(ed.state().geometry.pinNets.get('p2.net')).toBe('net1');
  });

  it('pressing on an open wire end carries the wire on from there', () => {
    const ed = headlessEditor();
    ed.key('9');
    ed.click(8, 0);
    ed.key('j');
    ed.click(0, 0); // start on empty sheet
    ed.click(4, 0); // a bend…
    ed.key('Escape'); // …then give up: nothing drawn
    expect(ed.state().doc.sheet.wires).toHaveLength(0);
    ed.key('j');
    ed.click(0, 0);
    ed.click(4, 0);
    ed.click(4, 0); // a second click on the same point ends the wire there
    expect(ed.state().geometry.openEnds).toEqual([
      { x: 0, y: 0 },
      { x: 4, y: 0 },
    ]);
    ed.drag({ x: 4, y: 0 }, { x: 8, y: 0 }); // from the open end to the label's pin
    expect(ed.state().doc.sheet.wires).toHaveLength(2);
    expect(ed.state().geometry.openEnds).toEqual([{ x: 0, y: 0 }]);
    expect(ed.state().geometry.wireNets).toEqual({ w1: 'net1', w2: 'net1' });
  });
});
