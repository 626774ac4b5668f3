// Indexes read here are in range by construction (inputs and their slots), so `!` marks them.
/**
 * Expected functions over words of vectors (docs/semantics.md §4, §2.10): each expression becomes
 * operations of the sweep's word program (wordProgram.ts), so the bit-parallel sweep can send a
 * vector whose output disagrees to the scalar engine, which writes the mismatch finding. Expressions
 * that can expect Z or read an output's held value are left to the scalar engine (null).
 */
import type { CompiledNetlist } from '../compile/compile.ts';
import { expressionNames } from '../expect/names.ts';
import { parseExpectation, type Expr } from '../expect/parse.ts';
import { ONES, ZERO, type WordProgram } from './wordProgram.ts';

export interface WordExpectations {
  /** Adds to `fallback` the lanes where some output differs from its expected value. */
  mismatch(program: WordProgram, netSlots: Int32Array, fallback: number): void;
}

/** The expected functions as word functions, or null when one can expect Z or reads an output. */
export function wordExpectations(
  c: CompiledNetlist,
  expectations: Readonly<Record<string, string>>,
): WordExpectations | null {
  const names = expressionNames(c.netlist);
  const checks: [number, Expr][] = [];
  for (const [output, text] of Object.entries(expectations)) {
    const net = c.netIndex.get(output);
    const e = parseExpectation(output, text, names);
    if (net === undefined || !wordReadable(e, c)) return null;
    checks.push([net, e]);
  }
  return {
    mismatch(program, netSlots, fallback) {
      for (const [net, e] of checks)
        program.orInto(fallback, program.xor(wordOf(e, c, program, netSlots), netSlots[net]!));
    },
  };
}

/** Whether the expression reads only inputs and never expects Z. */
function wordReadable(e: Expr, c: CompiledNetlist): boolean {
  switch (e.kind) {
    case 'const':
      return e.value !== 'Z';
    case 'name':
      return c.netlist.inputs.includes(e.name);
    case 'not':
      return wordReadable(e.arg, c);
    case 'choose':
      return wordReadable(e.select, c) && wordReadable(e.whenTrue, c) && wordReadable(e.whenFalse, c);
    default:
      return wordReadable(e.left, c) && wordReadable(e.right, c);
  }
}

/** The slot of the expression's word, its operations added to the program. */
function wordOf(e: Expr, c: CompiledNetlist, program: WordProgram, netSlots: Int32Array): number {
  const of = (x: Expr): number => wordOf(x, c, program, netSlots);
  switch (e.kind) {
    case 'const':
      return e.value === '1' ? ONES : ZERO;
    case 'name':
      return netSlots[c.inputNets[c.netlist.inputs.indexOf(e.name)]!]!;
    case 'not':
      return program.not(of(e.arg));
    case 'and':
      return program.and(of(e.left), of(e.right));
    case 'or':
      return program.or(of(e.left), of(e.right));
    case 'xor':
      return program.xor(of(e.left), of(e.right));
    case 'choose':
      return program.mux(of(e.select), of(e.whenFalse), of(e.whenTrue));
  }
}
