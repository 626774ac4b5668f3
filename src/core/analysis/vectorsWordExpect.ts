/**
 * Expected functions over words of vectors (docs/semantics.md §4, §2.10): each expression evaluated
 * for 32 two-valued vectors at once, so the bit-parallel sweep can send a vector whose output
 * disagrees to the scalar engine, which writes the mismatch finding. Expressions that can expect Z
 * or read an output's held value are left to the scalar engine (null).
 */
import type { CompiledNetlist } from '../compile/compile.ts';
import { expressionNames } from '../expect/names.ts';
import { parseExpectation, type Expr } from '../expect/parse.ts';

/** An expression's word: bit j is its value in vector j, from the nets' words in `high`. */
type WordExpr = (high: Int32Array) => number;

export interface WordExpectations {
  /** The lanes where some output differs from its expected value. */
  mismatch(high: Int32Array): number;
}

export function wordExpectations(
  c: CompiledNetlist,
  expectations: Readonly<Record<string, string>>,
): WordExpectations | null {
  const names = expressionNames(c.netlist);
  const checks: [number, WordExpr][] = [];
  for (const [output, text] of Object.entries(expectations)) {
    const net = c.netIndex.get(output);
    const word = wordExpr(parseExpectation(output, text, names), c);
    if (net === undefined || word === null) return null;
    checks.push([net, word]);
  }
  return {
    mismatch(high) {
      let differs = 0;
      for (const [net, word] of checks) differs |= word(high) ^ (high[net] as number);
      return differs;
    },
  };
}

/** The expression as a word function, or null when it can expect Z or reads an output. */
function wordExpr(e: Expr, c: CompiledNetlist): WordExpr | null {
  switch (e.kind) {
    case 'const':
      return e.value === 'Z' ? null : e.value === '1' ? () => -1 : () => 0;
    case 'name': {
      const input = c.netlist.inputs.indexOf(e.name);
      const net = c.inputNets[input];
      return input < 0 || net === undefined ? null : (high) => high[net] as number;
    }
    case 'not': {
      const arg = wordExpr(e.arg, c);
      return arg === null ? null : (high) => ~arg(high);
    }
    case 'and':
    case 'or':
    case 'xor': {
      const left = wordExpr(e.left, c);
      const right = wordExpr(e.right, c);
      if (left === null || right === null) return null;
      if (e.kind === 'and') return (high) => left(high) & right(high);
      if (e.kind === 'or') return (high) => left(high) | right(high);
      return (high) => left(high) ^ right(high);
    }
    case 'choose': {
      const select = wordExpr(e.select, c);
      const yes = wordExpr(e.whenTrue, c);
      const no = wordExpr(e.whenFalse, c);
      if (select === null || yes === null || no === null) return null;
      return (high) => {
        const s = select(high);
        return (s & yes(high)) | (~s & no(high));
      };
    }
  }
}
