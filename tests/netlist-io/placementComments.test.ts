// Our own comment lines for the drawing (docs/semantics.md §6); no published source applies.
import { describe, expect, it } from 'vitest';
import { placementLines, readPlacement } from '../../src/core/netlist-io/placementComments.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { autoPlace } from '../../src/core/sheet/autoPlace.ts';
import { starterById } from '../../src/core/starters/index.ts';
import type { Directive } from '../../src/core/netlist-io/spiceParse.ts';

/** The directives a reader finds in `* railwise: KEY VALUE` comment lines. */
function directivesOf(lines: readonly string[]): Directive[] {
  return lines.map((text, i) => {
    const m = /^\* railwise: (\S+)\s*(.*)$/.exec(text)!;
    return { line: i + 1, key: m[1]!.toLowerCase(), value: m[2]!.trim() };
  });
}

function nand2() {
  const sheet = autoPlace(starterById('nand2')!.design.netlist);
  return { sheet, netlist: sheetToNetlist(sheet, 'nand2').netlist };
}

describe('the drawing in comment lines', () => {
  it('reads back exactly the sheet that was written', () => {
    const { sheet, netlist } = nand2();
    const notes: string[] = [];
    expect(readPlacement(directivesOf(placementLines(sheet)), netlist, notes)).toEqual(sheet);
    expect(notes).toEqual([]);
  });

  it('keeps names that SPICE could not spell, as JSON strings', () => {
    const { sheet, netlist } = nand2();
    const odd = {
      ...sheet,
      parts: sheet.parts.map((p) => (p.name === 'Y' ? { ...p, name: 'out "a b"' } : p)),
    };
    const renamed = sheetToNetlist(odd, 'nand2').netlist;
    const lines = placementLines(odd);
    expect(lines.some((l) => l.endsWith('"out \\"a b\\""'))).toBe(true);
    expect(readPlacement(directivesOf(lines), renamed, [])).toEqual(odd);
    expect(netlist.outputs).toEqual(['Y']);
  });

  it('sets aside a drawing that no longer gives the netlist, and says so', () => {
    const { sheet, netlist } = nand2();
    const lines = placementLines(sheet).filter((l) => !l.includes('sheet-wire'));
    const notes: string[] = [];
    expect(readPlacement(directivesOf(lines), netlist, notes)).toBeNull();
    expect(notes[0]).toMatch(/set aside .*placed afresh/);
  });

  it('sets aside a line that does not read, naming it', () => {
    const { sheet, netlist } = nand2();
    const lines = [...placementLines(sheet), '* railwise: sheet-part p99 transistor 0 0 0 0 "Q"'];
    const notes: string[] = [];
    expect(readPlacement(directivesOf(lines), netlist, notes)).toBeNull();
    expect(notes[0]).toContain(`line ${lines.length}`);
    expect(notes[0]).toContain('no part kind transistor');
  });

  it('has nothing to say about a file without a drawing', () => {
    const notes: string[] = [];
    expect(readPlacement([], nand2().netlist, notes)).toBeNull();
    expect(notes).toEqual([]);
  });
});
