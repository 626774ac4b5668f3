import { readFileSync } from 'node:fs';
import { importSpice, type ImportedCell } from '../../src/core/netlist-io/spiceImport.ts';
import { leading } from '../helpers.ts';

/** A single-cell SPICE fixture of tests/solver/fixtures, read as the command line reads it. */
export function fixtureCell(file: string): ImportedCell {
  const path = `tests/solver/fixtures/${file}`;
  const [cell] = leading(importSpice(readFileSync(path, 'utf8'), path).cells, 1);
  return cell;
}
