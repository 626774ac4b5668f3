import { circuit } from '../../src/core/model/builder.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY, type Technology } from '../../src/core/model/technology.ts';

/** Square-law devices only: no body effect, no channel-length modulation (the books' hand analysis). */
export function squareLaw(tech: Partial<Technology>): Technology {
  return { ...DEFAULT_TECHNOLOGY, gamman: 0, gammap: 0, lambdan: 0, lambdap: 0, ...tech };
}

/** A static CMOS inverter from A to Y. */
export function cmosInverter(wn: number, wp: number, l = 0.25): Netlist {
  return circuit('inv')
    .rails()
    .input('A')
    .output('Y')
    .pmos('P1', { g: 'A', d: 'Y', s: 'VDD', w: wp, l })
    .nmos('N1', { g: 'A', d: 'Y', s: 'GND', w: wn, l })
    .build();
}

/** A pseudo-NMOS inverter from A to Y: a grounded-gate PMOS load over one NMOS. */
export function pseudoNmosInverter(wn: number, wp: number, l = 0.25): Netlist {
  return circuit('pseudo_nmos')
    .rails()
    .input('A')
    .output('Y')
    .pmos('PL', { g: 'GND', d: 'Y', s: 'VDD', w: wp, l })
    .nmos('N1', { g: 'A', d: 'Y', s: 'GND', w: wn, l })
    .build();
}
