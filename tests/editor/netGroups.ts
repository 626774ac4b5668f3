/**
 * Connectivity as a test reads it, independently of the editor's own judge: each pin's net, and
 * whether two states group the pins they share alike (a one-to-one renaming of nets).
 */
import type { RailwiseState } from '../../src/state/store.ts';

export function pinGroups(state: RailwiseState): Map<string, string> {
  return new Map(state.geometry.pinNets);
}

export function sameGroupsOnCommonPins(
  a: ReadonlyMap<string, string>,
  b: ReadonlyMap<string, string>,
): boolean {
  const forward = new Map<string, string>();
  const backward = new Map<string, string>();
  for (const [pin, net] of a) {
    const other = b.get(pin);
    if (other === undefined) continue;
    if ((forward.get(net) ?? other) !== other || (backward.get(other) ?? net) !== net) return false;
    forward.set(net, other);
    backward.set(other, net);
  }
  return true;
}
