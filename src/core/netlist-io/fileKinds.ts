/**
 * Which file names are read as what (docs/semantics.md §6), apart from the readers themselves so a
 * page can offer the right files without loading them.
 */

/** Extensions read as SPICE-compatible netlists, everywhere. */
export const SPICE_EXTENSIONS: readonly string[] = ['.sp', '.spi', '.spice', '.cir', '.net', '.cdl', '.ckt'];
export const DESIGN_EXTENSIONS: readonly string[] = ['.json'];

/** What a page's file choosers offer: design files and netlists (an `accept` attribute). */
export const OPEN_FILE_ACCEPT = [...DESIGN_EXTENSIONS, ...SPICE_EXTENSIONS].join(',');
