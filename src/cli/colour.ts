/**
 * Terminal colour, only when writing to a terminal and NO_COLOR is unset or empty (no-color.org).
 * Levels carry a letter as well as a colour, so nothing depends on colour alone.
 */
export interface Colour {
  readonly error: (s: string) => string;
  readonly warning: (s: string) => string;
  readonly dim: (s: string) => string;
  readonly bold: (s: string) => string;
  /** Colours a level by its value: 1 amber, 0 slate blue, X crimson, Z grey. */
  readonly level: (s: string) => string;
}

const wrap =
  (enabled: boolean, open: string) =>
  (s: string): string =>
    enabled ? `\u001b[${open}m${s}\u001b[0m` : s;

export function makeColour(enabled: boolean): Colour {
  const amber = wrap(enabled, '38;5;214');
  const slate = wrap(enabled, '38;5;67');
  const crimson = wrap(enabled, '38;5;160');
  const grey = wrap(enabled, '38;5;245');
  return {
    error: crimson,
    warning: amber,
    dim: grey,
    bold: wrap(enabled, '1'),
    level: (s) => (s === '1' ? amber(s) : s === '0' ? slate(s) : s === 'X' ? crimson(s) : grey(s)),
  };
}

export function colourWanted(isTty: boolean, env: Readonly<Record<string, string | undefined>>): boolean {
  return isTty && (env['NO_COLOR'] ?? '') === '';
}

/** Engineering notation with an SI prefix: 1.23e-3 A → "1.23 mA" (the panels' formatter). */
export { engineering as formatSi } from '../core/view/format.ts';
