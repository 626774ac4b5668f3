import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import type { EquivalentInverter } from './types.ts';

/** The shortest drawn channel length in the cell, µm: the length the reference inverter is drawn at. */
export function referenceLength(netlist: Netlist): number | null {
  const lengths = netlist.devices.flatMap((d) => (d.kind === 'nmos' || d.kind === 'pmos' ? [d.l] : []));
  return lengths.length === 0 ? null : Math.min(...lengths);
}

/**
 * The inverter with the same worst-case drive: its NMOS has the pull-down's resistance and its PMOS
 * the pull-up's, so it delivers the same output current (R = R_unit · L / W solved for W).
 */
export function equivalentInverter(
  tech: Technology,
  l: number,
  pullUpOhms: number,
  pullDownOhms: number,
): EquivalentInverter {
  const wn = (tech.rn * l) / pullDownOhms;
  const wp = (tech.rp * l) / pullUpOhms;
  return { wn, wp, l, cin: tech.cgPerArea * l * (wn + wp), cdiff: tech.cdPerWidth * (wn + wp) };
}

/** Gate capacitance each input drives, farads: every transistor gate on that net, W · L · Cox. */
export function inputCapacitance(netlist: Netlist, tech: Technology): Record<string, number> {
  const cin: Record<string, number> = {};
  for (const input of netlist.inputs) cin[input] = 0;
  for (const d of netlist.devices) {
    if ((d.kind === 'nmos' || d.kind === 'pmos') && d.gate in cin) cin[d.gate] += tech.cgPerArea * d.w * d.l;
  }
  return cin;
}

/**
 * Logical effort per input, g = Cin / Cinv (Sutherland, Sproull & Harris 1999, ch. 1): the input's
 * capacitance over that of the inverter with the same drive. An input that reaches no gate (it
 * only feeds a pass transistor's channel) has no logical effort in this sense: null.
 */
export function logicalEffort(
  cin: Readonly<Record<string, number>>,
  inverter: EquivalentInverter,
): Record<string, number | null> {
  const g: Record<string, number | null> = {};
  for (const [input, c] of Object.entries(cin))
    g[input] = c > 0 && inverter.cin > 0 ? c / inverter.cin : null;
  return g;
}

/** Parasitic delay in units of p_inv: output diffusion capacitance over the equivalent inverter's. */
export function parasiticDelay(outputDiffusion: number, inverter: EquivalentInverter): number | null {
  return inverter.cdiff > 0 ? outputDiffusion / inverter.cdiff : null;
}
