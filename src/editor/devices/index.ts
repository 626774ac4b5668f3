/** The registry of part views, keyed like the core part specs. Views only draw. */
import type { ComponentType } from 'react';
import type { PartKind } from '../../core/sheet/types.ts';
import type { PartViewProps } from './PartFrame.tsx';
import { NmosView } from './NmosView.tsx';
import { PmosView } from './PmosView.tsx';
import { ResistorView } from './ResistorView.tsx';
import { CapacitorView } from './CapacitorView.tsx';
import { RailView } from './RailView.tsx';
import { PinView } from './PinView.tsx';
import { NetLabelView } from './NetLabelView.tsx';

export type { PartViewProps } from './PartFrame.tsx';

export const PART_VIEWS: Readonly<Record<PartKind, ComponentType<PartViewProps>>> = {
  nmos: NmosView,
  pmos: PmosView,
  resistor: ResistorView,
  capacitor: CapacitorView,
  vdd: RailView,
  gnd: RailView,
  input: PinView,
  output: PinView,
  label: NetLabelView,
};
