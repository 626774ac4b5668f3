/**
 * A Liberty file attached to an opened design (docs/semantics.md §4): each cell takes the published
 * functions of the library cell of its name; sequential and missing cells get notes. The library
 * text is made up; the NAND2's function ¬(A·B) is the textbook one.
 *
 * Sources: the `function` attribute syntax is the Liberty format's as open cell libraries publish it;
 * the NAND2 and buffer truth tables are common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { checkLibraryCell } from '../../src/core/analysis/libraryCheck.ts';
import { attachLibertyFunctions } from '../../src/core/liberty/designFunctions.ts';
import { readLiberty } from '../../src/core/liberty/libertyCells.ts';
import { bufferDesign, cell, design } from '../hierarchy/cells.ts';
import { nand2 } from '../cells.ts';

const LIB = `library (quay) {
  cell (nand2) {
    pin (A) { direction : input ; }
    pin (B) { direction : input ; }
    pin (Y) { direction : output ; function : "!(A & B)" ; }
  }
  cell (buf) {
    pin (A) { direction : input ; }
    pin (Y) { direction : output ; function : "A" ; }
  }
  cell (quay_latch) {
    latch (IQ, IQN) { enable : "G" ; data_in : "D" ; }
    pin (D) { direction : input ; }
  }
}`;

describe('expected functions from a Liberty file', () => {
  const quay = design([cell(nand2), ...bufferDesign.cells], 'buf');
  const attached = attachLibertyFunctions(quay, readLiberty(LIB), 'quay.lib');

  it('gives each cell of the same name its published function', () => {
    expect(attached.matched).toBe(2);
    expect(attached.design.cells.find((c) => c.name === 'nand2')?.expectations).toEqual({ Y: '!((A & B))' });
    expect(attached.design.cells.find((c) => c.name === 'buf')?.expectations['Y']).toMatch(/A/);
  });

  it('notes the cells the library does not describe', () => {
    expect(attached.notes).toContain('inv: no cell of that name in quay.lib');
  });

  it('checks the cells against them: the NAND2 and the buffer pass', () => {
    for (const name of ['nand2', 'buf']) {
      const row = checkLibraryCell(attached.design, name);
      expect(row.status).toBe('pass');
      expect(Object.keys(row.expectations)).toEqual(['Y']);
    }
  });
});
