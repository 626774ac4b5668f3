import { describe, expect, it } from 'vitest';
import { proposeWidths } from '../../src/core/sizing/proposeWidths.ts';
import { sizingReport } from '../../src/core/sizing/sizingReport.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { aoi21, nand, nor, UNIT_RC_TECH } from './cells.ts';

/** The unit inverter of the book's sizing, γ = 2 (Weste & Harris, 4th ed., §4.4). */
const UNIT_INVERTER = { wn: 1, wp: 2 };

function widths(netlist: Netlist): Record<string, number> {
  return Object.fromEntries(netlist.devices.flatMap((d) => ('w' in d ? [[d.name, d.w]] : [])));
}

describe('proposeWidths: equal drive to a reference inverter', () => {
  it('NAND2 drawn at width 1 becomes NMOS 2, PMOS 2', () => {
    // Weste & Harris, 4th ed., §4.4: series NMOS doubled, parallel PMOS as in the inverter.
    const proposal = proposeWidths(nand(2, 1, 1), UNIT_RC_TECH, UNIT_INVERTER);
    expect(widths(proposal.netlist)).toEqual({ PA: 2, NA: 2, PB: 2, NB: 2 });
    expect(proposal.widths.NA).toEqual({ from: 1, to: 2 });
  });

  it('NOR3 drawn at width 1 becomes NMOS 1, PMOS 6 and then has g = 7/3', () => {
    // Weste & Harris, 4th ed., table 4.2: NOR3 logical effort 7/3 at that sizing.
    const proposal = proposeWidths(nor(3, 1, 1), UNIT_RC_TECH, UNIT_INVERTER);
    expect(widths(proposal.netlist)).toEqual({ PA: 6, NA: 1, PB: 6, NB: 1, PC: 6, NC: 1 });
    const g = sizingReport(proposal.netlist, UNIT_RC_TECH).logicalEffort.A as number;
    expect(g).toBeCloseTo(7 / 3, 9);
  });

  it('AOI21 drawn at width 1 becomes pull-down 2, 2, 1 and pull-up 4, 4, 4', () => {
    // Weste & Harris, 4th ed., compound gates sized for unit drive (from memory).
    const proposal = proposeWidths(aoi21(1), UNIT_RC_TECH, UNIT_INVERTER);
    expect(widths(proposal.netlist)).toEqual({ PA: 4, PB: 4, PC: 4, NA: 2, NB: 2, NC: 1 });
  });

  it('the proposal drives like the reference: worst pull-up and pull-down equal its resistances', () => {
    const reference = { wn: 1.5, wp: 3.5 };
    for (const cell of [nand(3, 1, 1), nor(2, 0.7, 0.9), aoi21(2)]) {
      const out = sizingReport(proposeWidths(cell, UNIT_RC_TECH, reference).netlist, UNIT_RC_TECH)
        .outputs[0]!;
      expect(out.pullDown?.ohms).toBeCloseTo(UNIT_RC_TECH.rn / reference.wn, 6);
      expect(out.pullUp?.ohms).toBeCloseTo(UNIT_RC_TECH.rp / reference.wp, 6);
    }
  });

  it('leaves the given netlist untouched', () => {
    const cell = aoi21(1);
    const copy = structuredClone(cell);
    proposeWidths(cell, UNIT_RC_TECH, UNIT_INVERTER);
    expect(cell).toEqual(copy);
  });
});
