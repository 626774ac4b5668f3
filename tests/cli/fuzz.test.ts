/**
 * Fuzzing the whole command with mutated netlists, design files and share links (fast-check, fixed
 * seeds): every case exits 0, 1 or 2; on 2 the one JSON document names the file and a line or a
 * field; nothing ends in an internal error; and whatever loads exports to SPICE and reads back as
 * the same netlist, and the same design of cells and instances when exported with its hierarchy. Robustness of our own tool: no published source applies.
 * `RAILWISE_FUZZ_RUNS=5000` runs the longer campaign by hand and prints the tally.
 */
import { readFileSync } from 'node:fs';
import { isDeepStrictEqual } from 'node:util';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { designFromFragment, encodeDesignFragment, ShareLinkError } from '../../src/app/shareLink.ts';
import { DesignFileError, parseDesignFile, serializeDesign } from '../../src/core/format/designFile.ts';
import type { Design } from '../../src/core/document/design.ts';
import { exportSpiceDesign } from '../../src/core/netlist-io/spiceDesignExport.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { cellsFromText, isDesignText } from '../../src/core/netlist-io/cellFiles.ts';
import { exportSpice } from '../../src/core/netlist-io/spiceExport.ts';
import { importSpice } from '../../src/core/netlist-io/spiceImport.ts';
import { starterById } from '../../src/core/starters/index.ts';
import { designOfCell } from '../../src/core/hierarchy/cellDesign.ts';
import { hostileDesignArb, hostileNetlistArb } from '../netlist-io/arbitraries.ts';
import { carriedCells, designOfSpice, findableCells } from '../netlist-io/designCarried.ts';
import { checkCase, fuzzFile, mutation, removeFuzzFiles, Tally, type Case } from './fuzzHarness.ts';

const RUNS = Number(process.env['RAILWISE_FUZZ_RUNS'] ?? 40);
afterAll(removeFuzzFiles);

const read = (path: string): string => readFileSync(path, 'utf8');
const NETLISTS = [
  'public/examples/tidewater-cells.sp',
  'public/examples/buffer-x2.sp',
  'public/examples/nand2-miswired.sp',
  'tests/cli/fixtures/divider.sp',
  'tests/cli/fixtures/tg.sp',
].map(read);
const hostile = fc.sample(hostileNetlistArb, { seed: 42, numRuns: 5 });
NETLISTS.push(
  ...hostile.map((n) =>
    exportSpice(n, DEFAULT_TECHNOLOGY, { expectations: { [n.outputs[0] ?? 'Y']: '!A' } }),
  ),
);
// Designs of several cells, hostile names throughout, as netlists and as design files.
const hierarchies = fc.sample(hostileDesignArb, { seed: 43, numRuns: 4 });
NETLISTS.push(...hierarchies.map(exportSpiceDesign));
const DESIGNS = [
  'public/examples/lamp-inverter.railwise.json',
  'public/examples/beacon-sr-latch.railwise.json',
].map(read);
DESIGNS.push(serializeDesign(designOfCell({ ...starterById('nand2')!.design, netlist: hostile[0]! })));
DESIGNS.push(...hierarchies.map((d) => serializeDesign(d)));

/**
 * Loads what the text holds and checks that each readable cell exports and reads back unchanged,
 * and the whole design, hierarchy kept, too.
 */
function exportsBack(text: string, file: string): Case {
  const whole = designExportsBack(text, file);
  if (whole !== null) return { outcome: 'bad', why: whole };
  for (const c of cellsFromText(text, file).cells) {
    if (!('job' in c)) continue;
    const { netlist, expectations, technology } = c.job;
    // The cell's own technology: it holds the model cards its transistors name.
    const again = importSpice(exportSpice(netlist, technology, { expectations }), 'again.sp');
    const back = again.cells[0];
    if (again.cells.length !== 1 || !isDeepStrictEqual(back?.netlist, netlist))
      return { outcome: 'bad', why: `export → import changed ${c.job.cell}` };
  }
  return { outcome: 'clean', why: '' };
}

/** The design the file holds, exported with its hierarchy: what reads back differently, or null. */
function designExportsBack(text: string, file: string): string | null {
  let design: Design;
  try {
    const read = isDesignText(file, text) ? parseDesignFile(text, file) : designOfSpice(text);
    if ('failure' in read) return null; // refused on reading: the command line said so
    design = read;
  } catch {
    return null;
  }
  const back = designOfSpice(exportSpiceDesign(design));
  if ('failure' in back) return `the design's export was refused: ${back.failure}`;
  const same = isDeepStrictEqual(carriedCells(back.cells), carriedCells(findableCells(design)));
  return same ? null : 'export → import changed the design';
}

/** The counts, printed on a campaign run; any bad case fails the test. */
function report(name: string, tally: Tally, exports?: Tally): void {
  const back =
    exports === undefined
      ? ''
      : `; ${exports.runs} export → import round trips, ${exports.counts.bad} changed`;
  tally.print(name, back);
  expect([...tally.bad, ...(exports?.bad ?? [])]).toEqual([]);
}

const mutated = (seeds: readonly string[]) =>
  fc
    .tuple(fc.nat(seeds.length - 1), fc.array(mutation, { minLength: 1, maxLength: 4 }))
    .map(([i, ms]) => ms.reduce((t, m) => m(t), seeds[i] as string));

describe('fuzzing the command line', () => {
  /** Checks each mutated file, and each clean one's export → import (tallied apart). */
  async function fuzzFiles(name: string, seeds: readonly string[], extension: string, seed: number) {
    const tally = new Tally();
    const exports = new Tally();
    await fc.assert(
      fc.asyncProperty(mutated(seeds), fc.boolean(), async (text, power) => {
        const file = fuzzFile(extension, text);
        const result = await checkCase(file, ...(power ? ['--power', '--sizing'] : []));
        tally.add(result, file);
        if (result.outcome === 'clean') exports.add(exportsBack(text, file), `${file} (export)`);
      }),
      { seed, numRuns: RUNS },
    );
    report(name, tally, exports);
  }

  it('mutated netlists', async () => {
    await fuzzFiles('netlists', NETLISTS, '.sp', 1601);
  }, 600_000);

  it('mutated design files', async () => {
    await fuzzFiles('design files', DESIGNS, '.json', 1602);
  }, 600_000);

  it('mutated share links', async () => {
    const tally = new Tally();
    const links = await Promise.all(DESIGNS.map(encodeDesignFragment));
    await fc.assert(
      fc.asyncProperty(fc.oneof(mutated(links), mutated(DESIGNS)), async (text) => {
        const fragment = text.startsWith('#design=')
          ? text
          : await encodeDesignFragment(text).catch(() => text);
        tally.add(await linkCase(fragment), fragment.slice(0, 60));
      }),
      { seed: 1603, numRuns: RUNS },
    );
    report('share links', tally);
  }, 600_000);
});

async function linkCase(fragment: string): Promise<Case> {
  try {
    await designFromFragment(fragment);
    return { outcome: 'clean', why: '' };
  } catch (e) {
    const located =
      e instanceof DesignFileError ? e.message.startsWith('shared link') : e instanceof ShareLinkError;
    return located ? { outcome: 'refusal', why: '' } : { outcome: 'bad', why: String(e) };
  }
}
