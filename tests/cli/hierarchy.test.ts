/**
 * `railwise check` on a hierarchical netlist: findings and current paths name devices inside
 * instances by their hierarchical names (docs/semantics.md §1, §5), and `--found` prints the
 * function each cell computes.
 *
 * Sources: the functions named (two inverters in a row give Y = A; a NAND2 gives ¬(A·B) = ¬A + ¬B by
 * De Morgan's law) are common practice, no source; the resistor-load inverter's static path VDD → load →
 * output → NMOS → GND is the usual ratioed-inverter current path (common practice, no source).
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { serializeDesign } from '../../src/core/format/designFile.ts';
import { bufferDesign } from '../hierarchy/cells.ts';
import { json, railwise } from './inProcess.ts';

const FILE = 'tests/cli/fixtures/quay-hierarchy.sp';

describe('hierarchical names in the report', () => {
  it('name the current path through the instance that carries it', async () => {
    const { body } = await json('check', FILE, '--cell', 'quay_rbuf');
    const findings = body['findings'] as { kind: string; path: string[] | null; devices: string[] }[];
    const current = findings.filter((f) => f.kind === 'static-current');
    // A = 0: X1's NMOS is off, so X1's load pulls mid high, which turns X2's NMOS on: X2 draws.
    expect(current[0]?.path).toEqual(['VDD', 'X2.RL', 'Y', 'X2.MN', 'GND']);
    // A = 1: X1 draws through its own load and NMOS.
    expect(current[1]?.path).toEqual(['VDD', 'X1.RL', 'mid', 'X1.MN', 'GND']);
  });
});

describe('a design file of several cells', () => {
  it('is checked cell by cell, each flattened, as a library', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'railwise-'));
    const file = join(dir, 'quay.railwise.json');
    writeFileSync(file, serializeDesign(bufferDesign));
    const { status, body } = await json('check', file);
    const cells = body['cells'] as { cell: string; vectors: { outputs: Record<string, string> }[] }[];
    expect(status).toBe(0);
    expect(cells.map((c) => c.cell)).toEqual(['inv', 'buf']);
    expect(cells[1]?.vectors.map((v) => v.outputs['Y'])).toEqual(['0', '1']); // two inverters: Y = A
  });
});

describe('--found', () => {
  it('prints the found function of every cell of a library', async () => {
    const r = await railwise('check', FILE, '--found');
    expect(r.out).toContain('found: Y = !A | !B'); // the NAND2: ¬(A·B) = ¬A + ¬B (De Morgan)
    expect(r.out).toContain('found: Y = A'); // the buffer
    expect(r.out).toContain('found: Y = !A'); // the inverter on its own
  });

  it('adds a found list to the JSON of each cell', async () => {
    const { body } = await json('check', FILE, '--cell', 'quay_nand2', '--found');
    expect(body['found']).toEqual([{ output: 'Y', expression: '!A | !B', undecided: 0, minimal: true }]);
  });

  it('is refused with --sequence, which has no sweep to read', async () => {
    const r = await railwise('check', FILE, '--cell', 'quay_nand2', '--found', '--sequence', 'A=1 B=1');
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/--found/);
  });
});
