/** Naming pins over what the importer inferred (docs/semantics.md §6: "flags override"). */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { circuit } from '../../src/core/model/builder.ts';
import { cellsFromText } from '../../src/core/netlist-io/cellFiles.ts';
import { assignPins, inputsReadByExpectations, PinError } from '../../src/core/netlist-io/pins.ts';

// As imported: a transmission gate's data port D reaches a channel, so it was taken as an output.
const tg = circuit('tg')
  .rails()
  .input('EN', 'ENB')
  .output('D', 'Y')
  .nmos('MN', { g: 'EN', d: 'D', s: 'Y' })
  .pmos('MP', { g: 'ENB', d: 'D', s: 'Y' })
  .build();

describe('assignPins', () => {
  it('given inputs replace the inferred ones; the other pins become outputs', () => {
    expect(assignPins(tg, { inputs: ['d', 'EN', 'ENB'] })).toMatchObject({
      inputs: ['D', 'EN', 'ENB'],
      outputs: ['Y'],
    });
  });

  it('given outputs replace the inferred ones and keep the remaining inputs', () => {
    expect(assignPins(tg, { outputs: ['Y'] })).toMatchObject({ inputs: ['EN', 'ENB'], outputs: ['Y'] });
    expect(assignPins(tg, { outputs: ['EN', 'Y'] })).toMatchObject({ inputs: ['ENB'], outputs: ['EN', 'Y'] });
  });

  it('changes nothing when nothing is given, and does not mutate the netlist', () => {
    const before = JSON.stringify(tg);
    expect(assignPins(tg, {})).toBe(tg);
    assignPins(tg, { inputs: ['D'] });
    expect(JSON.stringify(tg)).toBe(before);
  });

  it.each([
    [{ inputs: ['Q'] }, 'inputs', /no net "Q" \(its pins: EN, ENB, D, Y\)/],
    [{ outputs: ['VDD'] }, 'outputs', /VDD is a rail/],
    [{ inputs: ['D'], outputs: ['D'] }, 'outputs', /D is named both/],
  ])('%j is refused, naming the list', (choice, field, message) => {
    try {
      assignPins(tg, choice);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(PinError);
      expect((e as PinError).field).toBe(field);
      expect((e as PinError).message).toMatch(message);
    }
  });
});

describe('inputsReadByExpectations', () => {
  // A transmission gate passes D to Y when EN is high (common practice, no source).
  it('a port the expected function reads and does not describe is an input', () => {
    expect(inputsReadByExpectations(tg, { Y: 'EN ? D : Z' })).toEqual(['D']);
  });

  it('an output read in its own expression keeps holding, and a bad expression names nothing', () => {
    expect(inputsReadByExpectations(tg, { Y: 'EN ? D : Y', D: 'D' })).toEqual([]);
    expect(inputsReadByExpectations(tg, { Y: 'EN & (' })).toEqual([]);
  });
});

describe('an expect directive and no pin directives', () => {
  // The carry of a full adder is the majority of its three inputs (common practice, no source).
  it('reads the ports its expression reads as inputs', () => {
    const bare = readFileSync('tests/cli/fixtures/tgc-bare.sp', 'utf8');
    const text = bare.replace('.ends', '* railwise: expect CO = A & B | A & CI | B & CI\n.ends');
    const [cell] = cellsFromText(text, 'tgc.sp').cells;
    const job = cell !== undefined && 'job' in cell ? cell.job : null;
    expect([...(job?.netlist.inputs ?? [])].sort()).toEqual(['A', 'B', 'CI']);
    expect(job?.netlist.outputs).toEqual(['CO']);
  });
});
