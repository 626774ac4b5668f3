/** The SpiceImportError an import throws; fails the test when it imports or throws something else. */
import {
  importSpice,
  SpiceImportError,
  type SpiceImportOptions,
} from '../../src/core/netlist-io/spiceImport.ts';

export function refusalOf(text: string, file: string, options: SpiceImportOptions = {}): SpiceImportError {
  try {
    importSpice(text, file, options);
  } catch (e) {
    if (e instanceof SpiceImportError) return e;
    throw e;
  }
  throw new Error('expected a SpiceImportError');
}
