/**
 * The registry of part views, keyed like the core part specs. Views only draw. Every kind names
 * its view here; `SymbolView` draws any kind from its spec (symbol and text), so a kind needs a
 * view of its own only to draw something its spec cannot describe.
 */
import type { ComponentType } from 'react';
import type { PartKind } from '../../core/sheet/types.ts';
import { SymbolView, type PartViewProps } from './SymbolView.tsx';

export type { PartViewProps } from './SymbolView.tsx';

export const PART_VIEWS: Readonly<Record<PartKind, ComponentType<PartViewProps>>> = {
  nmos: SymbolView,
  pmos: SymbolView,
  resistor: SymbolView,
  capacitor: SymbolView,
  vdd: SymbolView,
  gnd: SymbolView,
  input: SymbolView,
  output: SymbolView,
  label: SymbolView,
  diode: SymbolView,
};
