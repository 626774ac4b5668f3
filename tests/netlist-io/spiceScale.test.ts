/**
 * Scale directives and sizes as published netlists write them (docs/semantics.md §6). `.option
 * scale=` and `.scale` multiply MOS W and L as SPICE-family simulators do; CDL's `*.SCALE METER`
 * comment says the numbers are metres (all from memory). A file with no directive whose sizes are
 * all a centimetre or more in metres is read in micrometres with a note (our own rule).
 */
import { describe, expect, it } from 'vitest';
import { importSpice, type SpiceImportError } from '../../src/core/netlist-io/spiceImport.ts';
import { refusalOf } from './refusal.ts';
import type { MosDevice } from '../../src/core/model/netlist.ts';

const FILE = 'kit/cells.cdl';

function cellOf(body: string, options = {}) {
  const result = importSpice(`.subckt inv A Y VDD VSS\n${body}\n.ends\n`, FILE, options);
  const mos = result.cells[0]?.netlist.devices.filter(
    (d): d is MosDevice => d.kind === 'nmos' || d.kind === 'pmos',
  );
  return { mos: mos ?? [], notes: [...result.notes, ...(result.cells[0]?.notes ?? [])] };
}

function refusal(text: string, options = {}): SpiceImportError {
  return refusalOf(text, FILE, options);
}

const PAIR = (w: string, l: string) => `MP Y A VDD VDD pch w=${w} l=${l}\nMN Y A VSS VSS nch w=${w} l=${l}`;

describe('scale directives', () => {
  it.each([
    ['.option scale=1e-6', '1.0', '0.15'],
    ['.options post scale=1u', '1.0', '0.15'],
    ['.scale 1e-6', '1.0', '0.15'],
    ['*.SCALE MICRON', '1.0', '0.15'],
    ['*.SCALE METER', '1u', '150n'],
  ])('%s reads the sizes as 1 µm by 0.15 µm', (directive, w, l) => {
    const { mos } = cellOf(`${directive}\n${PAIR(w, l)}`);
    expect(mos.map((d) => [d.w, d.l])).toEqual([
      [1, 0.15],
      [1, 0.15],
    ]);
  });

  it('reads huge numbers with a u suffix under a scale of 1e-6 exactly (w=650000u is 0.65 µm)', () => {
    const { mos } = cellOf(`.option scale=1e-6\n${PAIR('650000u', '150000u')}`);
    expect(mos[0]).toMatchObject({ w: 0.65, l: 0.15 });
  });

  it('takes --scale over the file and says so', () => {
    const { mos, notes } = cellOf(`.scale 1\n${PAIR('2', '0.5')}`, { scale: 1e-6 });
    expect(mos[0]).toMatchObject({ w: 2, l: 0.5 });
    expect(notes.some((n) => /--scale 0\.000001 used over the file's \.scale 1 \(line 2\)/.test(n))).toBe(
      true,
    );
  });

  it('refuses two scales that disagree, naming both lines', () => {
    const e = refusal(`.option scale=1e-6\n.scale 1e-9\n.subckt x A\n.ends`);
    expect(e.line).toBe(2);
    expect(e.message).toMatch(/contradicts the scale 0\.000001 given on line 1/);
  });
});

describe('a file with no directive', () => {
  it('reads bare sizes in micrometres when every one is implausible in metres, with a note', () => {
    const { mos, notes } = cellOf(PAIR('1.0', '0.15'));
    expect(mos[0]).toMatchObject({ w: 1, l: 0.15 });
    expect(notes).toContain(
      'no scale directive, and every W and L reads as 1 cm or more in metres (W=1.0 on line 2): read as micrometres, as under ".option scale=1e-6"',
    );
  });

  it('reads w=790000u l=150000u (0.79 m in metres) as 0.79 µm by the same rule', () => {
    expect(cellOf(PAIR('790000u', '150000u')).mos[0]).toMatchObject({ w: 0.79, l: 0.15 });
  });

  it('refuses one implausible size among plausible ones, with advice that is right for the text', () => {
    const base = `.subckt inv A Y VDD VSS\nMP Y A VDD VDD pch w=2u l=0.25u\n`;
    const bare = refusal(`${base}MN Y A VSS VSS nch w=1.0 l=0.25u\n.ends`);
    expect(bare.line).toBe(3);
    expect(bare.message).toMatch(
      /MN: W=1\.0 is 1 m \(plain numbers are metres\): write 1\.0u for µm, or if this file/,
    );
    const suffixed = refusal(`${base}MN Y A VSS VSS nch w=790000u l=0.25u\n.ends`);
    expect(suffixed.message).toMatch(
      /W=790000u is 0\.79 m, more than 1 cm: if this file writes sizes under a scale, add "\.option scale=1e-6"/,
    );
    expect(suffixed.message).not.toMatch(/uu/);
    const letter = refusal(`${base}MN Y A VSS VSS nch w=1x l=0.25u\n.ends`);
    expect(letter.message).toMatch(/W=1x is 1 m: "x" is not a scale factor .*write e\.g\. 1u for 1 µm/);
    expect(letter.message).not.toMatch(/1xu/);
  });
});
