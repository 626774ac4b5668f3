// Robustness only, no published values: no source applies.
/** docs/semantics.md §8: any text, or any JSON value, either loads or throws DesignFileError; nothing else escapes. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DesignFileError, parseDesignFile } from '../../src/core/format/designFile.ts';

function loadsOrNamesTheProblem(text: string): void {
  try {
    parseDesignFile(text, 'fuzz.json');
  } catch (e) {
    expect(e).toBeInstanceOf(DesignFileError);
    expect((e as DesignFileError).message.startsWith('fuzz.json')).toBe(true);
  }
}

describe('design file fuzz', () => {
  it('random text', () => {
    fc.assert(fc.property(fc.string(), loadsOrNamesTheProblem), { numRuns: 1000 });
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
    fc.assert(
      fc.property(doc, (d) => loadsOrNamesTheProblem(JSON.stringify(d))),
      { numRuns: 1000 },
    );
  });
});
