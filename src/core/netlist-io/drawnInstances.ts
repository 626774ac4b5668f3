/**
 * The instance symbols of a drawing carried in a SPICE file (placementComments.ts): a `sheet-part`
 * line of kind `instance` names the instance; the cell it places and the pins its symbol shows
 * come from that instance's `X` line and the placed cell as the file defines them
 * (core/hierarchy/instanceParts.ts). The drawing is kept only when its symbols are wired as the
 * `X` lines wire them; otherwise it is set aside with a note, as any drawing that no longer fits.
 */
import type { Instance } from '../model/design.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Sheet } from '../sheet/types.ts';
import type { SymbolProps } from './placementComments.ts';
import { sheetToNetlist } from '../sheet/toNetlist.ts';
import { pinsText } from '../sheet/parts/instance.ts';
import { symbolPins } from '../hierarchy/instanceParts.ts';
import { samePlainData } from '../model/plainData.ts';

/** A pin wired to the rail of its own name says no more than leaving it to join by name. */
function connections(instance: Instance, placed: Netlist | undefined): [string, string][] {
  const rails = new Set(placed?.rails.map((r) => r.net) ?? []);
  return Object.entries(instance.pins)
    .filter(([pin, net]) => !(rails.has(pin) && pin === net))
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
}

/** The props of each instance symbol a drawing may carry: the instance's cell and its pins. */
export function symbolProps(
  instances: readonly Instance[],
  netlistOf: (cell: string) => Netlist | undefined,
): SymbolProps {
  const byName = new Map(instances.map((i) => [i.name, i]));
  return (name) => {
    const instance = byName.get(name);
    if (instance === undefined) return null;
    const pins = symbolPins(netlistOf(instance.cell) ?? emptyNetlist, instance.pins);
    return { cell: instance.cell, pins: pinsText(pins) };
  };
}

/** The drawing when its symbols are wired as the `X` lines wire them; else null, noted. */
export function checkDrawnInstances(
  sheet: Sheet | null,
  instances: readonly Instance[],
  netlistOf: (cell: string) => Netlist | undefined,
  notes: string[],
): Sheet | null {
  if (sheet === null || !sheet.parts.some((p) => p.kind === 'instance')) return sheet;
  const byName = new Map(instances.map((i) => [i.name, i]));
  for (const got of sheetToNetlist(sheet).instances) {
    const wanted = byName.get(got.name) as Instance;
    const placed = netlistOf(wanted.cell);
    if (!samePlainData(connections(got, placed), connections(wanted, placed))) {
      notes.push(
        `the drawing carried in the file was set aside (its instance ${got.name} is wired otherwise than the file places it); the cell is placed afresh`,
      );
      return null;
    }
  }
  return sheet;
}

const emptyNetlist: Netlist = { name: '', devices: [], rails: [], inputs: [], outputs: [] };
