import { describe, expect, it } from 'vitest';
import { LEAD_LENGTH, pinLeads } from '../../src/core/view/pinLeads.ts';
import { part } from '../sheet/fixtures.ts';
import { leading } from '../helpers.ts';

const nmos = part('p1', 'nmos', 'N1', 10, 20);

describe('pin leads', () => {
  it('runs from each MOS pin toward the body by the lead length', () => {
    const leads = Object.fromEntries(pinLeads(nmos).map((l) => [l.pin, l]));
    // NMOS spec: gate (-2, 0), drain (0, -2), source (0, 2) in local units.
    expect(leads.drain).toEqual({ pin: 'drain', from: { x: 10, y: 18 }, to: { x: 10, y: 18 + LEAD_LENGTH } });
    expect(leads['source']?.to).toEqual({ x: 10, y: 22 - LEAD_LENGTH });
    expect(leads['gate']?.to).toEqual({ x: 8 + LEAD_LENGTH, y: 20 });
  });

  it('turns with the part', () => {
    const turned = pinLeads({ ...nmos, rotation: 1 }).find((l) => l.pin === 'drain');
    // One clockwise quarter turn (y down): the drain at local (0, -2) lands at (+2, 0).
    expect(turned?.from).toEqual({ x: 12, y: 20 });
    expect(turned?.to).toEqual({ x: 12 - LEAD_LENGTH, y: 20 });
  });

  it('points a naming part lead into its body', () => {
    const [lead] = leading(pinLeads({ ...nmos, kind: 'input', name: 'A' }), 1);
    expect(lead.from).toEqual({ x: 10, y: 20 });
    expect(lead.to.x).toBeLessThan(10);
  });
});
