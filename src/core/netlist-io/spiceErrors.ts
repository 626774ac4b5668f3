/** A netlist that cannot be used, with the file and 1-based line to look at. */
export class SpiceImportError extends Error {
  override readonly name = 'SpiceImportError';
  constructor(
    readonly file: string,
    readonly line: number,
    readonly detail: string,
  ) {
    super(`${file}:${line}: ${detail}`);
  }
}
