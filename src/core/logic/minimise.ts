/**
 * Two-level minimisation of a single-output Boolean function: the prime implicants by the
 * Quine–McCluskey method (W. V. Quine, "The problem of simplifying truth functions", Amer. Math.
 * Monthly 59(8), 1952; E. J. McCluskey, "Minimization of Boolean functions", Bell Syst. Tech. J.
 * 35(6), 1956), then the fewest primes that cover every minterm, fewest literals among equals, by
 * an exact branch-and-bound search over Petrick's cover problem (S. R. Petrick, 1956). A cover
 * problem too large for the exact search is covered greedily and the result says it is not proven
 * minimal. Minterm i gives variable v the bit (n − 1 − v) of i, so variable 0 is the most
 * significant, as truth tables list them.
 */

/** A product term: `care` has a 1 for each variable in the term, `value` its polarity there. */
export interface Cube {
  readonly care: number;
  readonly value: number;
}

export interface Cover {
  readonly cubes: readonly Cube[];
  /** False when the cover search gave up on proving minimality (the result is still correct). */
  readonly exact: boolean;
}

/** Variables the minimiser accepts: 2^12 minterms keep the prime search small. */
export const MAX_MINIMISE_VARIABLES = 12;
/** Primes left after the essential ones beyond which the exact search is not tried. */
const MAX_EXACT_PRIMES = 40;

export class MinimiseError extends Error {
  override readonly name = 'MinimiseError';
}

function bits(x: number): number {
  let c = 0;
  for (let v = x; v !== 0; v &= v - 1) c++;
  return c;
}

/** Every prime implicant of the function whose ones and don't-cares are given. */
export function primeImplicants(n: number, ones: readonly number[], dontCares: readonly number[]): Cube[] {
  const full = (1 << n) - 1;
  let layer = new Map<string, Cube>();
  for (const m of [...ones, ...dontCares]) layer.set(`${full}:${m}`, { care: full, value: m });
  const primes: Cube[] = [];
  while (layer.size > 0) {
    const next = new Map<string, Cube>();
    const combined = new Set<string>();
    const groups = new Map<number, Cube[]>();
    for (const c of layer.values()) groups.set(c.care, [...(groups.get(c.care) ?? []), c]);
    for (const group of groups.values()) {
      const byValue = new Set(group.map((c) => c.value));
      for (const c of group)
        for (let v = 0; v < n; v++) {
          const bit = 1 << v;
          if ((c.care & bit) === 0 || (c.value & bit) !== 0 || !byValue.has(c.value | bit)) continue;
          const merged = { care: c.care & ~bit, value: c.value & ~bit };
          next.set(`${merged.care}:${merged.value}`, merged);
          combined.add(`${c.care}:${c.value}`).add(`${c.care}:${c.value | bit}`);
        }
    }
    for (const [key, c] of layer) if (!combined.has(key)) primes.push(c);
    layer = next;
  }
  return primes;
}

export function covers(c: Cube, minterm: number): boolean {
  return (minterm & c.care) === c.value;
}

/** A minimal sum of products: the fewest terms, then the fewest literals. */
export function minimalCover(n: number, ones: readonly number[], dontCares: readonly number[] = []): Cover {
  if (n > MAX_MINIMISE_VARIABLES)
    throw new MinimiseError(`${n} inputs are more than the ${MAX_MINIMISE_VARIABLES} the minimiser takes`);
  if (ones.length === 0) return { cubes: [], exact: true };
  const primes = primeImplicants(n, ones, dontCares);
  const chosen: Cube[] = [];
  let left = [...new Set(ones)];
  // Essential primes: the only prime covering some minterm.
  for (const m of left) {
    const only = primes.filter((p) => covers(p, m));
    if (only.length === 1 && !chosen.includes(only[0] as Cube)) chosen.push(only[0] as Cube);
  }
  left = left.filter((m) => !chosen.some((c) => covers(c, m)));
  const candidates = primes.filter((p) => !chosen.includes(p) && left.some((m) => covers(p, m)));
  if (left.length === 0) return { cubes: chosen, exact: true };
  if (candidates.length > MAX_EXACT_PRIMES)
    return { cubes: [...chosen, ...greedy(candidates, left)], exact: false };
  return { cubes: [...chosen, ...exactCover(n, candidates, left)], exact: true };
}

function cost(cubes: readonly Cube[], n: number): number {
  return cubes.length * (n + 1) + cubes.reduce((s, c) => s + bits(c.care), 0);
}

/** Branch and bound: pick the minterm with fewest covering primes, try each. */
function exactCover(n: number, primes: readonly Cube[], minterms: readonly number[]): Cube[] {
  let best: Cube[] = greedy(primes, minterms);
  let bestCost = cost(best, n);
  const search = (left: readonly number[], picked: Cube[]): void => {
    if (cost(picked, n) >= bestCost) return;
    if (left.length === 0) {
      best = [...picked];
      bestCost = cost(picked, n);
      return;
    }
    let hardest = left[0] as number;
    let options = primes.filter((p) => covers(p, hardest));
    for (const m of left) {
      const o = primes.filter((p) => covers(p, m));
      if (o.length < options.length) [hardest, options] = [m, o];
    }
    for (const p of options)
      search(
        left.filter((m) => !covers(p, m)),
        [...picked, p],
      );
  };
  search(minterms, []);
  return best;
}

function greedy(primes: readonly Cube[], minterms: readonly number[]): Cube[] {
  const out: Cube[] = [];
  let left = [...minterms];
  while (left.length > 0) {
    let best = primes[0] as Cube;
    let bestCount = -1;
    for (const p of primes) {
      const count = left.filter((m) => covers(p, m)).length;
      if (count > bestCount || (count === bestCount && bits(p.care) < bits(best.care)))
        [best, bestCount] = [p, count];
    }
    out.push(best);
    left = left.filter((m) => !covers(best, m));
  }
  return out;
}

/**
 * A cover in the expected-function syntax of docs/semantics.md §4: `!A & B | C`; `0` for no term,
 * `1` for a term with no literal.
 */
export function coverText(cubes: readonly Cube[], names: readonly string[]): string {
  if (cubes.length === 0) return '0';
  const n = names.length;
  const terms = cubes.map((c) => {
    const literals = names.flatMap((name, v) => {
      const bit = 1 << (n - 1 - v);
      if ((c.care & bit) === 0) return [];
      return [(c.value & bit) !== 0 ? name : `!${name}`];
    });
    return literals.length === 0 ? '1' : literals.join(' & ');
  });
  return terms.includes('1') ? '1' : terms.join(' | ');
}
