// Behaviour of our own command, not published values: no source applies.
/**
 * The command's output, byte for byte, against what it printed before sweeps became columnar
 * (files in tests/cli/golden/, written by the code of that time). The small runs are kept whole so a
 * difference reads in the diff; the 8,192-vector cell, written vector by vector, is kept as its
 * length and SHA-256 (its JSON is about 45 MB).
 *
 * RAILWISE_WRITE_GOLDEN=1 writes the files anew from the code as it is: do that only for a change to
 * the output that is meant, and say so in the commit.
 */
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { railwise } from './inProcess.ts';

const LIB = 'public/examples/tidewater-cells.sp';
const LEDGER = 'tests/cli/fixtures/ledger-13.sp';
const DIR = 'tests/cli/golden';
const WRITE = process.env['RAILWISE_WRITE_GOLDEN'] === '1';

/** Name of the golden file, the command's arguments, and whether the file keeps a digest only. */
const RUNS: readonly (readonly [string, readonly string[], 'whole' | 'digest'])[] = [
  ['library.json', ['check', LIB, '--json'], 'whole'],
  ['library.txt', ['check', LIB], 'whole'],
  ['library-all-nets.json', ['check', LIB, '--json', '--all-nets'], 'whole'],
  ['library-undriven.json', ['check', LIB, '--json', '--undriven'], 'whole'],
  ['library-power.json', ['check', LIB, '--json', '--power'], 'whole'],
  ['miswired.json', ['check', 'public/examples/nand2-miswired.sp', '--json'], 'whole'],
  ['latch.json', ['check', 'public/examples/beacon-sr-latch.railwise.json', '--json'], 'whole'],
  ['ledger.txt', ['check', LEDGER], 'whole'],
  ['ledger.json.sha256', ['check', LEDGER, '--json'], 'digest'],
  ['ledger-all-nets.json.sha256', ['check', LEDGER, '--json', '--all-nets'], 'digest'],
];

function digest(text: string): string {
  return `${text.length} characters, sha256 ${createHash('sha256').update(text).digest('hex')}\n`;
}

describe('output as before (golden files)', () => {
  it.each(RUNS)('%s', async (file, argv, keep) => {
    const r = await railwise(...argv);
    const text = `exit ${r.status}\n${keep === 'whole' ? r.out : digest(r.out)}`;
    const path = `${DIR}/${file}`;
    if (WRITE) {
      if (!existsSync(DIR)) mkdirSync(DIR, { recursive: true });
      writeFileSync(path, text);
    }
    expect(text).toBe(readFileSync(path, 'utf8'));
  });
});
