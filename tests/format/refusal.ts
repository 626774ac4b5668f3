/** The DesignFileError a design file text is refused with; fails the test when it is read. */
import { DesignFileError, parseDesignFile } from '../../src/core/format/designFile.ts';

export function designFileError(text: string, fileName: string): DesignFileError {
  try {
    parseDesignFile(text, fileName);
  } catch (e) {
    if (e instanceof DesignFileError) return e;
    throw e;
  }
  throw new Error('expected a DesignFileError');
}
