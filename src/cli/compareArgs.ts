/**
 * Arguments of `railwise compare FILE_A FILE_B` (docs/semantics.md §5): the two files are read with
 * the same import flags as `check`; `--cell-a` and `--cell-b` pick a cell of a library.
 */
import type { ParseArgsConfig } from 'node:util';
import { cellChoice, parse, READING_OPTIONS, type CellChoice } from './args.ts';
import { UsageError } from './usage.ts';

/** `railwise compare FILE_A FILE_B`: the cells of two files, read with the same import options. */
export interface CompareArgs {
  readonly fileA: string;
  readonly fileB: string;
  /** How both files are read; `cell` is unset (each side has its own). */
  readonly choice: CellChoice;
  readonly cellA?: string;
  readonly cellB?: string;
  readonly json: boolean;
  readonly help: boolean;
}

const COMPARE_OPTIONS = {
  'cell-a': { type: 'string' },
  'cell-b': { type: 'string' },
  json: { type: 'boolean' },
  ...READING_OPTIONS,
  help: { type: 'boolean', short: 'h' },
} as const satisfies ParseArgsConfig['options'];

export function parseCompareArgs(argv: readonly string[]): CompareArgs {
  const { values: v, positionals } = parse(argv, COMPARE_OPTIONS);
  const help = v.help ?? false;
  if (!help && positionals.length !== 2)
    throw new UsageError('compare takes exactly two files, FILE_A FILE_B (see railwise compare --help)');
  return {
    fileA: positionals[0] ?? '',
    fileB: positionals[1] ?? '',
    choice: cellChoice(v),
    json: v.json ?? false,
    help,
    ...(v['cell-a'] === undefined ? {} : { cellA: v['cell-a'] }),
    ...(v['cell-b'] === undefined ? {} : { cellB: v['cell-b'] }),
  };
}
