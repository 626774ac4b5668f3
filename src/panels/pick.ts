/**
 * What a click on a finding, a path or a net does: show the cell that holds it (descending into an
 * instance when the name is hierarchical), highlight its nets and devices on the sheet, select the
 * devices and pan them into view. One place, shared by every list.
 */
import type { Finding } from '../core/analysis/report.ts';
import { findingTargets, toSheetTargets, type HighlightTargets } from '../core/view/highlight.ts';
import { selectDevices, setHighlight, store } from '../state/store.ts';
import { revealItems } from '../state/view.ts';
import { goToName } from '../state/navigation.ts';

export function pickTargets(targets: HighlightTargets): void {
  // A name inside an instance (`X1.N1`) takes the sheet to the cell that holds it first.
  for (const name of [...targets.devices, ...targets.nets]) if (goToName(name)) break;
  const { geometry } = store.getState();
  setHighlight({ nets: targets.nets, devices: targets.devices });
  if (targets.devices.length > 0) selectDevices(targets.devices);
  const onSheet = toSheetTargets(targets, {
    wiresOfNet: (net) => Object.keys(geometry.wireNets).filter((id) => geometry.wireNets[id] === net),
    partOfDevice: (device) => geometry.deviceParts[device],
  });
  // Devices say where a problem is; a net alone (often spread across the cell) is shown by its wires.
  const reveal =
    onSheet.partIds.length > 0
      ? { parts: onSheet.partIds, wires: [] }
      : { parts: [], wires: onSheet.wireIds };
  if (reveal.parts.length + reveal.wires.length > 0) revealItems(reveal);
}

export function pickFinding(finding: Finding): void {
  pickTargets(findingTargets(finding));
}

export function pickNet(net: string): void {
  pickTargets({ nets: [net], devices: [] });
}
