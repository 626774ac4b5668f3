import type { CellDesign } from '../document/design.ts';
import type { Netlist } from '../model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../model/technology.ts';
import * as comb from './combinational.ts';
import * as seq from './sequential.ts';

/** A cell to begin from. The set is our own teaching library, "Glasswing starters" (fictional). */
export interface StarterCell {
  readonly id: string;
  readonly title: string;
  readonly summary: string;
  readonly design: CellDesign;
}

function starter(
  id: string,
  title: string,
  summary: string,
  netlist: Netlist,
  expectations: Record<string, string>,
  sequences: CellDesign['sequences'] = [],
): StarterCell {
  return {
    id,
    title,
    summary,
    design: { name: netlist.name, technology: DEFAULT_TECHNOLOGY, netlist, expectations, sequences },
  };
}

export const STARTERS: readonly StarterCell[] = [
  starter('inverter', 'Inverter', 'Unit static CMOS inverter.', comb.inverter, { Y: '!A' }),
  starter('nand2', 'NAND2', 'Two-input NAND, series NMOS stack.', comb.nand2, { Y: '!(A & B)' }),
  starter('nor2', 'NOR2', 'Two-input NOR, series PMOS stack.', comb.nor2, { Y: '!(A | B)' }),
  starter('aoi21', 'AOI21', 'AND-OR-invert: Y = !(A·B + C).', comb.aoi21, { Y: '!(A & B | C)' }),
  starter('oai21', 'OAI21', 'OR-AND-invert: Y = !((A + B)·C).', comb.oai21, { Y: '!((A | B) & C)' }),
  starter(
    'transmission-gate',
    'Transmission gate',
    'NMOS and PMOS in parallel; floats when off.',
    comb.transmissionGate,
    {
      Y: 'EN ? A : Z',
    },
  ),
  starter(
    'mux2',
    '2:1 multiplexer (transmission gates)',
    'Y = S ? D1 : D0 through two transmission gates.',
    comb.mux2,
    {
      Y: 'S ? D1 : D0',
    },
  ),
  starter(
    'tristate-inverter',
    'Tristate inverter',
    'Inverts A when EN = 1, high-impedance otherwise.',
    comb.tristateInverter,
    {
      Y: 'EN ? !A : Z',
    },
  ),
  starter(
    'resistor-load-inverter',
    'Resistor-load inverter',
    'Ratioed: draws static current while the output is low.',
    comb.resistorLoadInverter,
    {
      Y: '!A',
    },
  ),
  starter(
    'ratioed-nor2',
    'Ratioed NOR2 (PMOS load)',
    'Pseudo-NMOS NOR: grounded-gate PMOS load.',
    comb.ratioedNor2,
    {
      Y: '!(A | B)',
    },
  ),
  starter(
    'nand-latch',
    'Cross-coupled NAND latch',
    'Active-low set and reset; holds when both are 1.',
    seq.nandLatch,
    // An output named in its own expected function is the value it held (docs/semantics.md §4).
    { Q: '!Sb | Rb & Q', Qb: '!Rb | Sb & Qb' },
    [
      {
        name: 'set, hold, reset, hold',
        steps: [{ Sb: '0', Rb: '1' }, { Sb: '1' }, { Rb: '0' }, { Rb: '1' }],
      },
    ],
  ),
  starter(
    'tg-d-latch',
    'Transmission-gate D latch',
    'Transparent while CLK = 1, holds while CLK = 0.',
    seq.tgDLatch,
    { Q: 'CLK ? D : Q' },
    [
      {
        name: 'capture 1, hold, capture 0, hold',
        steps: [{ CLK: '1', D: '1' }, { CLK: '0' }, { D: '0' }, { CLK: '1' }, { CLK: '0', D: '1' }],
      },
    ],
  ),
  starter(
    'sram6t',
    'Six-transistor memory cell',
    'Write through the bit lines; read with them precharged and left at Z.',
    seq.sixTransistorCell,
    { Q: 'WL & (BL ^ BLB) ? BL : Q', Qb: 'WL & (BL ^ BLB) ? BLB : Qb' },
    [
      {
        name: 'write 1, write 0, read',
        steps: [
          { WL: '1', BL: '1', BLB: '0' },
          { WL: '0' },
          { WL: '1', BL: '0', BLB: '1' },
          { WL: '0', BL: '1', BLB: '1' },
          { BL: 'Z', BLB: 'Z' },
          { WL: '1' },
        ],
      },
    ],
  ),
  starter(
    'precharged-and2',
    'Precharged AND2',
    'Dynamic AND: precharge at CLK = 0, evaluate at CLK = 1.',
    seq.prechargedAnd2,
    { Y: 'CLK & (A & B | Y)' },
    [
      {
        name: 'discharge, precharge, evaluate with B = 0 (charge sharing)',
        steps: [
          { CLK: '1', A: '1', B: '1' },
          { CLK: '0', A: '0', B: '0' },
          { CLK: '1', A: '1' },
        ],
      },
    ],
  ),
];

export function starterById(id: string): StarterCell | undefined {
  return STARTERS.find((s) => s.id === id);
}
