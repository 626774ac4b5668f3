// Robustness only, no published values: no source applies.
/** docs/semantics.md §8: any text, or any JSON value, either loads or throws DesignFileError; nothing else escapes. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DesignFileError, parseDesignFile } from '../../src/core/format/designFile.ts';
import { Tally } from '../fuzzTally.ts';

function loadsOrNamesTheProblem(text: string, tally: Tally): void {
  try {
    parseDesignFile(text, 'fuzz.json');
    tally.add({ outcome: 'clean', why: '' }, text);
  } catch (e) {
    const clear = e instanceof DesignFileError && e.message.startsWith('fuzz.json');
    tally.add({ outcome: clear ? 'refusal' : 'bad', why: String(e) }, JSON.stringify(text).slice(0, 80));
    expect(e).toBeInstanceOf(DesignFileError);
    expect((e as DesignFileError).message.startsWith('fuzz.json')).toBe(true);
  }
}

describe('design file fuzz', () => {
  it('random text', () => {
    const tally = new Tally();
    fc.assert(
      fc.property(fc.string(), (t) => loadsOrNamesTheProblem(t, tally)),
      { numRuns: 1000 },
    );
    tally.print('random text (design file reader)');
  });

  it('random JSON, also under the format tag', () => {
    const doc = fc.oneof(
      fc.jsonValue(),
      fc
        .dictionary(
          fc.constantFrom('netlist', 'name', 'technology', 'sequences', 'sheet', 'devices'),
          fc.jsonValue(),
        )
        .map((d) => ({
          format: 'railwise-design',
          version: 1,
          ...d,
        })),
    );
    const tally = new Tally();
    fc.assert(
      fc.property(doc, (d) => loadsOrNamesTheProblem(JSON.stringify(d), tally)),
      { numRuns: 1000 },
    );
    tally.print('random JSON (design file reader)');
  });
});
