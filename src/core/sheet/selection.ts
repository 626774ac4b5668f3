/** A set of sheet items, as the editor selects, moves, copies and deletes them. */
export interface ItemIds {
  readonly parts: readonly string[];
  readonly wires: readonly string[];
}

export const NO_ITEMS: ItemIds = { parts: [], wires: [] };

export function isEmptyItems(ids: ItemIds): boolean {
  return ids.parts.length === 0 && ids.wires.length === 0;
}
