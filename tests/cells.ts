/** Small cells for the workspace tests, built with the core builder. */
import { circuit } from '../src/core/model/builder.ts';
import type { CellDesign } from '../src/core/document/design.ts';
import type { Netlist } from '../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../src/core/model/technology.ts';

export function design(netlist: Netlist, expectations: Record<string, string> = {}): CellDesign {
  return { name: netlist.name, technology: DEFAULT_TECHNOLOGY, netlist, expectations, sequences: [] };
}

/** Resistor-load inverter: 40 kΩ from VDD to Y, one NMOS W/L = 1/0.25 µm from Y to GND. */
export const RESISTOR_LOAD_OHMS = 40e3;
export const resistorLoadInverter = circuit('rload_inv')
  .rails()
  .input('A')
  .output('Y')
  .resistor('R1', 'VDD', 'Y', RESISTOR_LOAD_OHMS)
  .nmos('N1', { g: 'A', d: 'Y', s: 'GND' })
  .build();

export const inverter = circuit('inv')
  .rails()
  .input('A')
  .output('Y')
  .pmos('P1', { g: 'A', d: 'Y', s: 'VDD', w: 2 })
  .nmos('N1', { g: 'A', d: 'Y', s: 'GND' })
  .build();

/** NAND2 with both pull-up PMOS. */
export const nand2 = circuit('nand2')
  .rails()
  .input('A', 'B')
  .output('Y')
  .pmos('PA', { g: 'A', d: 'Y', s: 'VDD' })
  .pmos('PB', { g: 'B', d: 'Y', s: 'VDD' })
  .nmos('NA', { g: 'A', d: 'Y', s: 'X1' })
  .nmos('NB', { g: 'B', d: 'X1', s: 'GND' })
  .build();

/** The same NAND2 with the PMOS on B missing: Y floats for A = 1, B = 0. */
export const nand2MissingPullUp: Netlist = {
  ...nand2,
  name: 'nand2_broken',
  devices: nand2.devices.filter((d) => d.name !== 'PB'),
};

/** Cross-coupled NAND latch with active-low set SN and reset RN: Q = !(SN & QN), QN = !(RN & Q). */
export const nandLatch = circuit('nand_latch')
  .rails()
  .input('SN', 'RN')
  .output('Q', 'QN')
  .pmos('P1', { g: 'SN', d: 'Q', s: 'VDD' })
  .pmos('P2', { g: 'QN', d: 'Q', s: 'VDD' })
  .nmos('N1', { g: 'SN', d: 'Q', s: 'M1' })
  .nmos('N2', { g: 'QN', d: 'M1', s: 'GND' })
  .pmos('P3', { g: 'RN', d: 'QN', s: 'VDD' })
  .pmos('P4', { g: 'Q', d: 'QN', s: 'VDD' })
  .nmos('N3', { g: 'RN', d: 'QN', s: 'M2' })
  .nmos('N4', { g: 'Q', d: 'M2', s: 'GND' })
  .build();
