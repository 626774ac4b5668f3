// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * Names as another format can carry them. Every format has its own rules for what an identifier
 * may hold and when two are the same (SPICE readers ignore case; IEEE Std 1364 treats `\mid_node `
 * and `mid_node` as one name), and some words it reserves. `exportNames` gives each of our names
 * an identifier that is legal, unique under the format's notion of sameness, and as close to the
 * original as it can be; the exports list every name that had to change, so nothing is lost.
 */

export interface IdentifierRules {
  /**
   * The name with every character the format cannot hold replaced and cut to
   * MAX_IDENTIFIER_LENGTH (it may still be reserved or taken).
   */
  readonly legal: (name: string) => string;
  /** The n-th variant of a legal identifier; `base_n` unless the format needs otherwise. */
  readonly numbered?: (base: string, n: number) => string;
  /** The form under which the reader compares two identifiers. */
  readonly sameAs: (identifier: string) => string;
  /** Identifiers that must not be used as they are (keywords, names with a meaning of their own). */
  readonly reserved: (identifier: string) => boolean;
}

/** Longest identifier written; a longer name is cut and numbered (its full text is in the listing). */
export const MAX_IDENTIFIER_LENGTH = 200;

export interface ExportedNames {
  /** The identifier of each name, position by position. */
  readonly identifiers: readonly string[];
  /** [original, identifier] for every position whose name had to change, in order. */
  readonly renamed: readonly (readonly [string, string])[];
}

/**
 * Identifiers for `names`, one per position (a name given twice gets two identifiers). Names that
 * are already legal and free keep their spelling, first come first served; the others take their
 * legal form, numbered `_2`, `_3`, … until it is free. `taken` holds identifiers (in `sameAs`
 * form) already used in the same name space.
 */
export function exportNames(
  names: readonly string[],
  rules: IdentifierRules,
  taken: Iterable<string> = [],
): ExportedNames {
  const used = new Set(taken);
  const identifiers: (string | undefined)[] = names.map((name) => {
    const key = rules.sameAs(name);
    const keeps = rules.legal(name) === name && !rules.reserved(name);
    if (!keeps || used.has(key)) return undefined;
    used.add(key);
    return name;
  });
  names.forEach((name, i) => {
    if (identifiers[i] !== undefined) return;
    const base = rules.legal(name) || '_';
    const numbered = rules.numbered ?? ((b: string, n: number): string => `${b}_${n}`);
    let candidate = base;
    for (let n = 2; rules.reserved(candidate) || used.has(rules.sameAs(candidate)); n++) {
      candidate = numbered(base, n);
    }
    identifiers[i] = candidate;
    used.add(rules.sameAs(candidate));
  });
  const done = identifiers as string[];
  const renamed = names.flatMap((n, i) => (done[i] === n ? [] : [[n, done[i]!] as const]));
  return { identifiers: done, renamed };
}

/** The identifiers of distinct names as a lookup. */
export function identifierMap(
  names: readonly string[],
  exported: ExportedNames,
): ReadonlyMap<string, string> {
  return new Map(names.map((n, i) => [n, exported.identifiers[i] as string]));
}
