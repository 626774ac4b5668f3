import type { Expr } from '../expect/parse.ts';
import { FALSE, TRUE, type Cnf } from './cnf.ts';

/** An expected value as literals: at most one holds; none means X (any level passes). */
export interface ExpectedLits {
  readonly e0: number;
  readonly e1: number;
  readonly ez: number;
}

const X: ExpectedLits = { e0: FALSE, e1: FALSE, ez: FALSE };

/**
 * An expected function (docs/semantics.md §4) over the input pins, with the rules of
 * `expect/evaluate.ts` for every vector at once: a name that is no input (an output's held value,
 * unknown in a sweep) is X; Z as an operand gives X; `S ? A : B` with S unknown is A where A and B
 * agree.
 */
export function encodeExpected(cnf: Cnf, e: Expr, input: (name: string) => number | undefined): ExpectedLits {
  switch (e.kind) {
    case 'const':
      return {
        e0: e.value === '0' ? TRUE : FALSE,
        e1: e.value === '1' ? TRUE : FALSE,
        ez: e.value === 'Z' ? TRUE : FALSE,
      };
    case 'name': {
      const x = input(e.name);
      return x === undefined ? X : { e0: -x, e1: x, ez: FALSE };
    }
    case 'not': {
      const a = encodeExpected(cnf, e.arg, input);
      return { e0: a.e1, e1: a.e0, ez: FALSE };
    }
    case 'and':
    case 'or':
    case 'xor':
      return combine(cnf, e.kind, encodeExpected(cnf, e.left, input), encodeExpected(cnf, e.right, input));
    case 'choose': {
      const s = encodeExpected(cnf, e.select, input);
      const t = encodeExpected(cnf, e.whenTrue, input);
      const f = encodeExpected(cnf, e.whenFalse, input);
      const unsure = cnf.and([-s.e0, -s.e1]);
      const pick = (a: number, b: number): number =>
        cnf.or([cnf.and([s.e1, a]), cnf.and([s.e0, b]), cnf.and([unsure, a, b])]);
      return { e0: pick(t.e0, f.e0), e1: pick(t.e1, f.e1), ez: pick(t.ez, f.ez) };
    }
  }
}

function combine(cnf: Cnf, op: 'and' | 'or' | 'xor', a: ExpectedLits, b: ExpectedLits): ExpectedLits {
  switch (op) {
    case 'and':
      return { e0: cnf.or([a.e0, b.e0]), e1: cnf.and([a.e1, b.e1]), ez: FALSE };
    case 'or':
      return { e0: cnf.and([a.e0, b.e0]), e1: cnf.or([a.e1, b.e1]), ez: FALSE };
    case 'xor':
      return {
        e0: cnf.or([cnf.and([a.e0, b.e0]), cnf.and([a.e1, b.e1])]),
        e1: cnf.or([cnf.and([a.e0, b.e1]), cnf.and([a.e1, b.e0])]),
        ez: FALSE,
      };
  }
}
