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

/** The only escape sequences the report writes itself: the colours above and the reset. */
const OWN_SEQUENCE = new RegExp(`^${String.fromCharCode(27)}\\[(?:38;5;\\d{1,3}|1|0)m`);

/**
 * The last guard before a terminal or a log: every control character but line breaks and tabs is
 * shown escaped, except the colour sequences the report wrote itself when colour is on. Names are
 * escaped where they are printed; this catches anything that slipped through.
 */
export function terminalSafe(text: string, colour: boolean): string {
  return text.replace(/[\p{Cc}\u2028\u2029\u202a-\u202e\u2066-\u2069]/gu, (ch, at: number) => {
    if (ch === '\n' || ch === '\t') return ch;
    if (colour && ch === '\u001b' && OWN_SEQUENCE.test(text.slice(at, at + 12))) return ch;
    return `\\u${ch.charCodeAt(0).toString(16).padStart(4, '0')}`;
  });
}
