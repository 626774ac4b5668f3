import { circuit, type CircuitBuilder } from '../model/builder.ts';

/**
 * Static CMOS starter cells, sized with the γ = 2 convention of logical effort (common practice; W&H
 * §4.4): a unit inverter has NMOS W/L = 2 (0.5 µm / 0.25 µm) and PMOS twice as wide; series stacks
 * are widened by their length so each network matches the unit inverter's drive.
 */
const L = 0.25;
const UNIT_N = 0.5;
const UNIT_P = 1.0;

/** Adds an inverter from `a` to `y` with devices named P<tag> and N<tag>. */
export function addInverter(b: CircuitBuilder, tag: string, a: string, y: string, scale = 1): CircuitBuilder {
  return b
    .pmos(`P${tag}`, { g: a, d: y, s: 'VDD', w: UNIT_P * scale, l: L })
    .nmos(`N${tag}`, { g: a, d: y, s: 'GND', w: UNIT_N * scale, l: L });
}

export const inverter = addInverter(
  circuit('inverter').rails().input('A').output('Y'),
  '1',
  'A',
  'Y',
).build();

export const nand2 = circuit('nand2')
  .rails()
  .input('A', 'B')
  .output('Y')
  .pmos('PA', { g: 'A', d: 'Y', s: 'VDD', w: UNIT_P, l: L })
  .pmos('PB', { g: 'B', d: 'Y', s: 'VDD', w: UNIT_P, l: L })
  .nmos('NA', { g: 'A', d: 'Y', s: 'x1', w: 2 * UNIT_N, l: L })
  .nmos('NB', { g: 'B', d: 'x1', s: 'GND', w: 2 * UNIT_N, l: L })
  .build();

export const nor2 = circuit('nor2')
  .rails()
  .input('A', 'B')
  .output('Y')
  .pmos('PA', { g: 'A', d: 'x1', s: 'VDD', w: 2 * UNIT_P, l: L })
  .pmos('PB', { g: 'B', d: 'Y', s: 'x1', w: 2 * UNIT_P, l: L })
  .nmos('NA', { g: 'A', d: 'Y', s: 'GND', w: UNIT_N, l: L })
  .nmos('NB', { g: 'B', d: 'Y', s: 'GND', w: UNIT_N, l: L })
  .build();

/** Y = !(A & B | C): pull-down A·B in series, parallel with C; pull-up the dual. */
export const aoi21 = circuit('aoi21')
  .rails()
  .input('A', 'B', 'C')
  .output('Y')
  .pmos('PA', { g: 'A', d: 'x1', s: 'VDD', w: 2 * UNIT_P, l: L })
  .pmos('PB', { g: 'B', d: 'x1', s: 'VDD', w: 2 * UNIT_P, l: L })
  .pmos('PC', { g: 'C', d: 'Y', s: 'x1', w: 2 * UNIT_P, l: L })
  .nmos('NA', { g: 'A', d: 'Y', s: 'x2', w: 2 * UNIT_N, l: L })
  .nmos('NB', { g: 'B', d: 'x2', s: 'GND', w: 2 * UNIT_N, l: L })
  .nmos('NC', { g: 'C', d: 'Y', s: 'GND', w: UNIT_N, l: L })
  .build();

/** Y = !((A | B) & C): pull-down A ∥ B in series with C; pull-up the dual. */
export const oai21 = circuit('oai21')
  .rails()
  .input('A', 'B', 'C')
  .output('Y')
  .pmos('PA', { g: 'A', d: 'x1', s: 'VDD', w: 2 * UNIT_P, l: L })
  .pmos('PB', { g: 'B', d: 'Y', s: 'x1', w: 2 * UNIT_P, l: L })
  .pmos('PC', { g: 'C', d: 'Y', s: 'VDD', w: UNIT_P, l: L })
  .nmos('NA', { g: 'A', d: 'Y', s: 'x2', w: 2 * UNIT_N, l: L })
  .nmos('NB', { g: 'B', d: 'Y', s: 'x2', w: 2 * UNIT_N, l: L })
  .nmos('NC', { g: 'C', d: 'x2', s: 'GND', w: 2 * UNIT_N, l: L })
  .build();

/** A transmission gate with its own enable inverter: Y follows A when EN = 1, floats otherwise. */
export const transmissionGate = addInverter(
  circuit('transmission_gate').rails().input('A', 'EN').output('Y'),
  'E',
  'EN',
  'ENb',
)
  .nmos('NT', { g: 'EN', d: 'A', s: 'Y', w: UNIT_N, l: L })
  .pmos('PT', { g: 'ENb', d: 'A', s: 'Y', w: UNIT_P, l: L })
  .capacitor('CL', 'Y', 'GND', 5e-15)
  .build();

/** 2:1 multiplexer from two transmission gates: Y = S ? D1 : D0. */
export const mux2 = addInverter(circuit('mux2_tg').rails().input('D0', 'D1', 'S').output('Y'), 'S', 'S', 'Sb')
  .nmos('N0', { g: 'Sb', d: 'D0', s: 'Y', w: UNIT_N, l: L })
  .pmos('P0', { g: 'S', d: 'D0', s: 'Y', w: UNIT_P, l: L })
  .nmos('N1', { g: 'S', d: 'D1', s: 'Y', w: UNIT_N, l: L })
  .pmos('P1', { g: 'Sb', d: 'D1', s: 'Y', w: UNIT_P, l: L })
  .build();

/** Tristate inverter: Y = !A when EN = 1, high-impedance when EN = 0. */
export const tristateInverter = addInverter(
  circuit('tristate_inverter').rails().input('A', 'EN').output('Y'),
  'E',
  'EN',
  'ENb',
)
  .pmos('PA', { g: 'A', d: 'x1', s: 'VDD', w: 2 * UNIT_P, l: L })
  .pmos('PEN', { g: 'ENb', d: 'Y', s: 'x1', w: 2 * UNIT_P, l: L })
  .nmos('NEN', { g: 'EN', d: 'Y', s: 'x2', w: 2 * UNIT_N, l: L })
  .nmos('NA', { g: 'A', d: 'x2', s: 'GND', w: 2 * UNIT_N, l: L })
  .build();

/** Resistor-load inverter: 20 kΩ pull-up against an NMOS of W/L = 4 (about 3.25 kΩ on). */
export const resistorLoadInverter = circuit('resistor_load_inverter')
  .rails()
  .input('A')
  .output('Y')
  .resistor('RL', 'VDD', 'Y', 20e3)
  .nmos('N1', { g: 'A', d: 'Y', s: 'GND', w: 1, l: L })
  .build();

/**
 * Ratioed (pseudo-NMOS) NOR2: a grounded-gate PMOS load about a quarter as strong as one pull-down
 * NMOS (W&H's rule of thumb for pseudo-NMOS loads).
 */
export const ratioedNor2 = circuit('ratioed_nor2')
  .rails()
  .input('A', 'B')
  .output('Y')
  .pmos('PL', { g: 'GND', d: 'Y', s: 'VDD', w: 0.6, l: L })
  .nmos('NA', { g: 'A', d: 'Y', s: 'GND', w: 1, l: L })
  .nmos('NB', { g: 'B', d: 'Y', s: 'GND', w: 1, l: L })
  .build();
