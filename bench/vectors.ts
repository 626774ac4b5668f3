// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/** Input vectors for the benchmark: seeded random ones and the exhaustive enumeration. */
import type { InputValue, InputVector } from '../src/core/model/design.ts';

/**
 * mulberry32, a 32-bit seeded generator (Tommy Ettinger's public-domain design, from memory): the
 * same seed gives the same vectors on every run, so runs compare like with like.
 */
export function seededRandom(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const bit = (on: boolean): InputValue => (on ? '1' : '0');

/** `count` random 0/1 vectors over `inputs`. */
export function randomVectors(inputs: readonly string[], count: number, seed = 1): InputVector[] {
  const random = seededRandom(seed);
  return Array.from({ length: count }, () => Object.fromEntries(inputs.map((n) => [n, bit(random() < 0.5)])));
}

/** Vector number `index` of an exhaustive sweep: input i takes bit i of the index (first input least significant). */
export function vectorAt(inputs: readonly string[], index: number): InputVector {
  return Object.fromEntries(inputs.map((n, i) => [n, bit(((index >>> i) & 1) === 1)]));
}

/** Operand value `value` spread over `nets`, least significant first. */
export function operand(nets: readonly string[], value: number): Record<string, InputValue> {
  return Object.fromEntries(nets.map((n, i) => [n, bit(((value >>> i) & 1) === 1)]));
}

/**
 * A closed walk of single-input toggles: from a random vector, flip one random input `steps` times,
 * then retrace the flips back to the start. Going round it, every step changes exactly one input.
 */
export function toggleWalk(inputs: readonly string[], steps: number, seed = 5): InputVector[] {
  const random = seededRandom(seed);
  const forward: InputVector[] = randomVectors(inputs, 1, seed + 1);
  for (let s = 0; s < steps; s++) {
    const previous = forward[forward.length - 1]!;
    const name = inputs[Math.floor(random() * inputs.length)]!;
    forward.push({ ...previous, [name]: previous[name] === '1' ? '0' : '1' });
  }
  return [...forward, ...forward.slice(1, -1).reverse()];
}
