import { circuit } from '../model/builder.ts';
import { addInverter } from './combinational.ts';

const L = 0.25;

/** NAND2 gate from inputs a, b to y, devices suffixed with `tag`. */
function nandGate(name: string, tag: string, a: string, b: string, y: string) {
  return (builder: ReturnType<typeof circuit>) =>
    builder
      .pmos(`PA${tag}`, { g: a, d: y, s: 'VDD', w: 1, l: L })
      .pmos(`PB${tag}`, { g: b, d: y, s: 'VDD', w: 1, l: L })
      .nmos(`NA${tag}`, { g: a, d: y, s: `${name}_x`, w: 1, l: L })
      .nmos(`NB${tag}`, { g: b, d: `${name}_x`, s: 'GND', w: 1, l: L });
}

/** Cross-coupled NAND latch with active-low set (Sb) and reset (Rb): Q = !(Sb & Qb), Qb = !(Rb & Q). */
export const nandLatch = nandGate(
  'u2',
  '2',
  'Rb',
  'Q',
  'Qb',
)(
  nandGate('u1', '1', 'Sb', 'Qb', 'Q')(circuit('nand_latch').rails().input('Sb', 'Rb').output('Q', 'Qb')),
).build();

/**
 * Transmission-gate D latch: transparent while CLK = 1 (D passes to the storage node n1), holding
 * through the feedback gate while CLK = 0.
 */
export const tgDLatch = addInverter(
  addInverter(
    addInverter(circuit('tg_d_latch').rails().input('D', 'CLK').output('Q'), 'C', 'CLK', 'CLKb'),
    'F',
    'n1',
    'Qb',
  ),
  'B',
  'Qb',
  'Q',
)
  .nmos('NT1', { g: 'CLK', d: 'D', s: 'n1', w: 0.5, l: L })
  .pmos('PT1', { g: 'CLKb', d: 'D', s: 'n1', w: 1, l: L })
  .nmos('NT2', { g: 'CLKb', d: 'Q', s: 'n1', w: 0.5, l: L })
  .pmos('PT2', { g: 'CLK', d: 'Q', s: 'n1', w: 1, l: L })
  .build();

/**
 * Six-transistor memory cell with its bit lines as inputs (drive them to write, leave them at Z to
 * read). Cell ratio 2 (pull-down twice the access device) and weak pull-ups: common practice.
 * The bit-line capacitors stand for the column's wiring and other cells.
 */
export const sixTransistorCell = circuit('sram6t')
  .rails()
  .input('WL', 'BL', 'BLB')
  .output('Q', 'Qb')
  .pmos('PU1', { g: 'Qb', d: 'Q', s: 'VDD', w: 0.5, l: L })
  .nmos('PD1', { g: 'Qb', d: 'Q', s: 'GND', w: 1, l: L })
  .pmos('PU2', { g: 'Q', d: 'Qb', s: 'VDD', w: 0.5, l: L })
  .nmos('PD2', { g: 'Q', d: 'Qb', s: 'GND', w: 1, l: L })
  .nmos('AX1', { g: 'WL', d: 'BL', s: 'Q', w: 0.5, l: L })
  .nmos('AX2', { g: 'WL', d: 'BLB', s: 'Qb', w: 0.5, l: L })
  .capacitor('CBL', 'BL', 'GND', 50e-15)
  .capacitor('CBLB', 'BLB', 'GND', 50e-15)
  .build();

/**
 * Precharged (dynamic) AND2: CLK = 0 precharges X high; CLK = 1 evaluates through the A-B stack and
 * the footer; the output inverter gives Y = A & B during evaluation.
 */
export const prechargedAnd2 = addInverter(
  circuit('precharged_and2').rails().input('CLK', 'A', 'B').output('Y'),
  'O',
  'X',
  'Y',
)
  .pmos('PPRE', { g: 'CLK', d: 'X', s: 'VDD', w: 1, l: L })
  .nmos('NA', { g: 'A', d: 'X', s: 'm1', w: 1, l: L })
  .nmos('NB', { g: 'B', d: 'm1', s: 'm2', w: 1, l: L })
  .nmos('NCLK', { g: 'CLK', d: 'm2', s: 'GND', w: 1, l: L })
  .build();
