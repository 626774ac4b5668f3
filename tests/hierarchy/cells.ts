/** Small hierarchical designs for the hierarchy tests, built from the shared cells and starters. */
import { circuit } from '../../src/core/model/builder.ts';
import type { Cell, Design } from '../../src/core/document/design.ts';
import type { Instance } from '../../src/core/model/design.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { tgDLatch } from '../../src/core/starters/sequential.ts';
import { inverter } from '../cells.ts';

export function cell(netlist: Netlist, instances: readonly Instance[] = [], expectations = {}): Cell {
  return { name: netlist.name, netlist, instances, expectations, sequences: [] };
}

export function design(cells: readonly Cell[], open: string): Design {
  return { name: open, technology: DEFAULT_TECHNOLOGY, cells, open };
}

/** Two inverters in a row (Y = A), the rails of each inverter joined by name. */
export const buffer = cell(circuit('buf').input('A').output('Y').build(), [
  { name: 'X1', cell: 'inv', pins: { A: 'A', Y: 'mid' } },
  { name: 'X2', cell: 'inv', pins: { A: 'mid', Y: 'Y' } },
]);
export const bufferDesign = design([cell(inverter), buffer], 'buf');

/**
 * Master–slave D flip-flop from two transmission-gate latches (each transparent while its CLK is
 * 1): the master sees the inverted clock, the slave the clock, so Q takes D at the rising edge.
 */
export const latchCell = cell(tgDLatch);
export const flipFlop = cell(
  circuit('dff')
    .rails()
    .input('D', 'CLK')
    .output('Q')
    .pmos('P0', { g: 'CLK', d: 'CLKN', s: 'VDD', w: 2 })
    .nmos('N0', { g: 'CLK', d: 'CLKN', s: 'GND' })
    .build(),
  [
    { name: 'XM', cell: 'tg_d_latch', pins: { D: 'D', CLK: 'CLKN', Q: 'M' } },
    { name: 'XS', cell: 'tg_d_latch', pins: { D: 'M', CLK: 'CLK', Q: 'Q' } },
  ],
);
export const flipFlopDesign = design([latchCell, flipFlop], 'dff');
