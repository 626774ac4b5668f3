/**
 * What to light up on the sheet for a finding or a current path, and how those names map to the
 * sheet's wires and parts. Pure: the lookups come from the document's derived netlist.
 */
import type { CurrentPath, Finding } from '../analysis/report.ts';

export interface HighlightTargets {
  readonly nets: readonly string[];
  readonly devices: readonly string[];
}

/** Lookups the editor knows: which wires carry a net, which part draws a device. */
export interface SheetLookup {
  readonly wiresOfNet: (net: string) => readonly string[];
  readonly partOfDevice: (device: string) => string | undefined;
}

export interface SheetTargets {
  readonly wireIds: readonly string[];
  readonly partIds: readonly string[];
}

/** A chain alternates nets and devices: [VDD, P1, Y, N1, GND] (even positions are nets). */
export function splitChain(chain: readonly string[]): HighlightTargets {
  return {
    nets: chain.filter((_, i) => i % 2 === 0),
    devices: chain.filter((_, i) => i % 2 === 1),
  };
}

function unique(names: readonly string[]): string[] {
  return [...new Set(names)];
}

/** The nets and devices a finding names, including every member of its current path. */
export function findingTargets(finding: Finding): HighlightTargets {
  const path = finding.path === null ? { nets: [], devices: [] } : splitChain(finding.path);
  return {
    nets: unique([...finding.nets, ...path.nets]),
    devices: unique([...finding.devices, ...path.devices]),
  };
}

export function pathTargets(path: CurrentPath): HighlightTargets {
  return splitChain(path.chain);
}

/** Names to sheet ids; names the sheet does not draw (netlist-only nets) are skipped. */
export function toSheetTargets(targets: HighlightTargets, lookup: SheetLookup): SheetTargets {
  const parts = targets.devices.map(lookup.partOfDevice).filter((id): id is string => id !== undefined);
  return { wireIds: unique(targets.nets.flatMap(lookup.wiresOfNet)), partIds: unique(parts) };
}

/** `VDD → P1 → Y → N1 → GND`: the chain as the findings list prints it. */
export function chainText(chain: readonly string[]): string {
  return chain.join(' → ');
}
