/**
 * What a click on a finding, a path or a net does: highlight its nets and devices on the sheet and
 * select the devices so the designer can jump to them. One place, shared by every list.
 */
import type { Finding } from '../core/analysis/report.ts';
import { findingTargets, type HighlightTargets } from '../core/view/highlight.ts';
import { selectDevices, setHighlight } from '../state/store.ts';

export function pickTargets(targets: HighlightTargets): void {
  setHighlight({ nets: targets.nets, devices: targets.devices });
  if (targets.devices.length > 0) selectDevices(targets.devices);
}

export function pickFinding(finding: Finding): void {
  pickTargets(findingTargets(finding));
}

export function pickNet(net: string): void {
  pickTargets({ nets: [net], devices: [] });
}
