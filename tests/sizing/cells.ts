/**
 * Drawn gates for the sizing and power tests, built with the project's circuit builder.
 * Widths default to the book sizing of Weste & Harris, 4th ed. (γ = 2: a unit inverter has NMOS 1,
 * PMOS 2); pass other widths to test scaling and the width proposal.
 */
import { circuit } from '../../src/core/model/builder.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import type { Technology } from '../../src/core/model/technology.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';

/**
 * The unit RC model of Weste & Harris, 4th ed., §4.3: a unit NMOS has resistance R, a unit PMOS 2R
 * (γ = 2), and every unit of width brings C of gate and C of diffusion capacitance. Lengths are 1 so
 * a width in "units" is W/L. R = 10 kΩ and C = 1 fF are arbitrary scale factors.
 */
export const UNIT_R = 10e3;
export const UNIT_C = 1e-15;
export const UNIT_RC_TECH: Technology = {
  ...DEFAULT_TECHNOLOGY,
  source: 'unit RC model (Weste & Harris, 4th ed., §4.3)',
  rn: UNIT_R,
  rp: 2 * UNIT_R,
  cgPerArea: UNIT_C,
  cdPerWidth: UNIT_C,
};

const L = 1;

export function inverter(wn = 1, wp = 2): Netlist {
  return circuit('inv')
    .rails()
    .input('A')
    .output('Y')
    .pmos('P1', { g: 'A', d: 'Y', s: 'VDD', w: wp, l: L })
    .nmos('N1', { g: 'A', d: 'Y', s: 'GND', w: wn, l: L })
    .build();
}

/** NAND of n inputs: parallel PMOS, series NMOS with A nearest the output. */
export function nand(n: number, wn = n, wp = 2): Netlist {
  const names = Array.from({ length: n }, (_, i) => String.fromCharCode(65 + i));
  let b = circuit(`nand${n}`)
    .rails()
    .input(...names)
    .output('Y');
  names.forEach((x, i) => {
    b = b.pmos(`P${x}`, { g: x, d: 'Y', s: 'VDD', w: wp, l: L });
    const above = i === 0 ? 'Y' : `n${i}`;
    const below = i === n - 1 ? 'GND' : `n${i + 1}`;
    b = b.nmos(`N${x}`, { g: x, d: above, s: below, w: wn, l: L });
  });
  return b.build();
}

/** NOR of n inputs: series PMOS with A nearest the supply, parallel NMOS. */
export function nor(n: number, wn = 1, wp = 2 * n): Netlist {
  const names = Array.from({ length: n }, (_, i) => String.fromCharCode(65 + i));
  let b = circuit(`nor${n}`)
    .rails()
    .input(...names)
    .output('Y');
  names.forEach((x, i) => {
    const above = i === 0 ? 'VDD' : `p${i}`;
    const below = i === n - 1 ? 'Y' : `p${i + 1}`;
    b = b.pmos(`P${x}`, { g: x, d: below, s: above, w: wp, l: L });
    b = b.nmos(`N${x}`, { g: x, d: 'Y', s: 'GND', w: wn, l: L });
  });
  return b.build();
}

/** AOI21, Y = !(A & B | C), every transistor drawn at width w. */
export function aoi21(w = 1): Netlist {
  return circuit('aoi21')
    .rails()
    .input('A', 'B', 'C')
    .output('Y')
    .pmos('PA', { g: 'A', d: 'm', s: 'VDD', w, l: L })
    .pmos('PB', { g: 'B', d: 'm', s: 'VDD', w, l: L })
    .pmos('PC', { g: 'C', d: 'Y', s: 'm', w, l: L })
    .nmos('NA', { g: 'A', d: 'Y', s: 'x', w, l: L })
    .nmos('NB', { g: 'B', d: 'x', s: 'GND', w, l: L })
    .nmos('NC', { g: 'C', d: 'Y', s: 'GND', w, l: L })
    .build();
}

/** Every transistor's width multiplied by k. */
export function scaled(netlist: Netlist, k: number): Netlist {
  return {
    ...netlist,
    devices: netlist.devices.map((d) => (d.kind === 'nmos' || d.kind === 'pmos' ? { ...d, w: d.w * k } : d)),
  };
}
