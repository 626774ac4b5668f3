import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { headlessEditor } from '../editor/headless.ts';
import { pinGroups, sameGroupsOnCommonPins } from '../editor/netGroups.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { documentFromDesign } from '../../src/state/document.ts';
import { setSelection } from '../../src/state/store.ts';

/**
 * docs/semantics.md §1, "No silent connections", on every starter cell: any run of Turn, Flip and
 * nudges on any parts either is refused (the document is untouched and a warning says why) or keeps
 * every pin on the same net as before, up to the names of unnamed nets.
 */
const KEYS = ['q', 'f', 'ArrowLeft', 'ArrowRight', 'ArrowUp', 'ArrowDown'] as const;

describe('arranging never changes the circuit', () => {
  it('property: each command is refused or keeps every pin’s net', () => {
    const seen = { carried: 0, refused: 0 };
    const step = fc.record({
      pick: fc.array(fc.nat(), { minLength: 1, maxLength: 3 }),
      key: fc.constantFrom(...KEYS),
    });
    fc.assert(
      fc.property(
        fc.nat({ max: STARTERS.length - 1 }),
        fc.array(step, { minLength: 1, maxLength: 6 }),
        (cell, steps) => {
          const ed = headlessEditor(documentFromDesign(STARTERS[cell]!.design));
          for (const { pick, key } of steps) {
            const parts = ed.state().doc.sheet.parts;
            setSelection({ parts: [...new Set(pick.map((i) => parts[i % parts.length]!.id))], wires: [] });
            const before = ed.state().doc;
            const groups = pinGroups(ed.state());
            ed.key(key);
            const s = ed.state();
            if (s.doc === before) {
              if (s.message?.kind === 'warning') seen.refused++;
              continue;
            }
            seen.carried++;
            expect(sameGroupsOnCommonPins(groups, pinGroups(s))).toBe(true);
          }
        },
      ),
      { numRuns: 60 },
    );
    // Both outcomes occur, so the property is not vacuous.
    expect(seen.carried).toBeGreaterThan(20);
    expect(seen.refused).toBeGreaterThan(0);
  });
});
