/** The piecewise JSON writer: the same text as JSON.stringify(value, null, 2), and always a document.
 *
 * Source: the text must equal what ECMA-262 (ECMAScript), JSON.stringify with an indent of 2, writes,
 * and be valid JSON per RFC 8259; the comparison is against the engine's own JSON.stringify.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Later, Raw, Stream, writeJson } from '../../src/cli/jsonWriter.ts';

function written(value: unknown): { text: string; calls: number } {
  const parts: string[] = [];
  writeJson(value, (lines) => parts.push(`${lines}\n`));
  return { text: parts.join(''), calls: parts.length };
}

describe('writeJson', () => {
  it('writes exactly what JSON.stringify(value, null, 2) writes, for any JSON value', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (value) => {
        expect(written(value).text).toBe(`${JSON.stringify(value, null, 2)}\n`);
      }),
      { seed: 5, numRuns: 300 },
    );
  });

  it('writes streams, later values and raw text as the values they stand for', () => {
    const rows = [{ a: 1 }, { b: [1, 2] }, {}];
    const lazy = {
      cell: 'c',
      vectors: new Stream<object>((emit) => rows.forEach(emit)),
      none: new Stream<object>(() => undefined),
      findings: new Raw(JSON.stringify([{ kind: 'x' }], null, 2)),
      summary: new Later(() => ({ vectors: 3 })),
      skipped: undefined,
      list: [new Later(() => 1), 2],
    };
    const plain = {
      cell: 'c',
      vectors: rows,
      none: [],
      findings: [{ kind: 'x' }],
      summary: { vectors: 3 },
      list: [1, 2],
    };
    expect(written(lazy).text).toBe(`${JSON.stringify(plain, null, 2)}\n`);
  });

  it('writes a long stream in many pieces without holding it', () => {
    let held = 0;
    const value = {
      vectors: new Stream<object>((emit) => {
        for (let i = 0; i < 20_000; i++) emit({ i, pad: 'x'.repeat(20) });
      }),
    };
    const parts: string[] = [];
    writeJson(value, (lines) => {
      held = Math.max(held, lines.length);
      parts.push(`${lines}\n`);
    });
    expect(parts.length).toBeGreaterThan(10);
    expect(held).toBeLessThan(70_000);
    expect((JSON.parse(parts.join('')) as { vectors: unknown[] }).vectors).toHaveLength(20_000);
  });

  it('closes a stream that fails part way, reports it in the enclosing object, then throws', () => {
    const parts: string[] = [];
    const value = {
      cells: [
        {
          cell: 'a',
          vectors: new Stream<number>((emit) => {
            emit(1);
            emit(2);
            throw new Error('solver fell over');
          }),
          summary: new Later(() => ({ ok: true })),
        },
      ],
    };
    expect(() => writeJson(value, (l) => parts.push(`${l}\n`))).toThrow('solver fell over');
    const doc = JSON.parse(parts.join('')) as { cells: { vectors: number[]; error: { message: string } }[] };
    expect(doc.cells[0]?.vectors).toEqual([1, 2]);
    expect(doc.cells[0]?.error.message).toContain('solver fell over');
    expect(Object.keys(doc)).toEqual(['cells']);
  });
});
