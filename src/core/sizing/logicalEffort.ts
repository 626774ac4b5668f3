import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import type { EquivalentInverter } from './types.ts';
import { nameRecord } from '../model/records.ts';

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
  const cin = nameRecord<number>();
  for (const input of netlist.inputs) cin[input] = 0;
  for (const d of netlist.devices) {
    if ((d.kind === 'nmos' || d.kind === 'pmos') && d.gate in cin)
      cin[d.gate] = (cin[d.gate] ?? 0) + tech.cgPerArea * d.w * d.l;
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
  const g = nameRecord<number | null>();
  for (const [input, c] of Object.entries(cin))
    g[input] = c > 0 && inverter.cin > 0 ? c / inverter.cin : null;
  return g;
}

/** Parasitic delay in units of p_inv: output diffusion capacitance over the equivalent inverter's. */
export function parasiticDelay(outputDiffusion: number, inverter: EquivalentInverter): number | null {
  return inverter.cdiff > 0 ? outputDiffusion / inverter.cdiff : null;
}

/** Resistances that set the rising and falling efforts of one output, ohms. */
export interface EdgeDrive {
  readonly up: number;
  readonly down: number;
  /** An always-on pull-up (a ratioed load) that the pull-down must overcome; null if none. */
  readonly fightUp: number | null;
  /** An always-on pull-down that the pull-up must overcome; null if none. */
  readonly fightDown: number | null;
}

export interface EdgeEfforts {
  readonly rise: Record<string, number | null>;
  readonly fall: Record<string, number | null>;
}

/**
 * Logical effort of each transition against the technology's own inverter (PMOS γ = Rp/Rn times
 * the NMOS): the rising effort compares Cin with the inverter giving the same pull-up current, the
 * falling one with the inverter giving the same pull-down current, and a ratioed stage's current is
 * what is left after the always-on load takes its share — the method of Weste & Harris, 4th ed.,
 * §9.2 for skewed and pseudo-NMOS gates.
 */
export function edgeEfforts(
  cin: Readonly<Record<string, number>>,
  tech: Technology,
  l: number,
  drive: EdgeDrive,
): EdgeEfforts {
  const gamma = tech.rp / tech.rn;
  const net = (own: number, fight: number | null): number => 1 / own - (fight === null ? 0 : 1 / fight);
  const wp = tech.rp * l * net(drive.up, drive.fightDown);
  const wn = tech.rn * l * net(drive.down, drive.fightUp);
  const cinvRise = tech.cgPerArea * l * wp * (1 + 1 / gamma);
  const cinvFall = tech.cgPerArea * l * wn * (1 + gamma);
  const ratio = (c: number, cinv: number): number | null => (c > 0 && cinv > 0 ? c / cinv : null);
  const rise = nameRecord<number | null>();
  const fall = nameRecord<number | null>();
  for (const [input, c] of Object.entries(cin)) {
    rise[input] = ratio(c, cinvRise);
    fall[input] = ratio(c, cinvFall);
  }
  return { rise, fall };
}
