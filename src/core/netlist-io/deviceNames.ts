/**
 * Device types from names (docs/semantics.md §6). Model names of `M` lines, and subcircuits that a
 * kit instantiates as transistors without defining them (`X1 d g s b sky130_fd_pr__nfet_01v8 w=… l=…`),
 * say their type in their name: `nmos`, `nfet`, `nch` or a word `n` for NMOS; `pmos`, `pfet`, `pch`
 * or a word `p` for PMOS (common practice, no source). A name that says both or neither decides
 * nothing, and the user names the type (`--treat-as NAME=nmos`).
 */
import type { MosKind } from '../model/netlist.ts';

/** What an undefined subcircuit can stand for. */
export type StandIn = MosKind | 'diode' | 'short';

export const STAND_INS: readonly StandIn[] = ['nmos', 'pmos', 'diode', 'short'];

const NMOS_STEM = /nmos|nfet|nch/;
const PMOS_STEM = /pmos|pfet|pch/;

/** NMOS or PMOS from a model or device name, or null when the name does not decide. */
export function mosTypeFromName(name: string): MosKind | null {
  const lower = name.toLowerCase();
  const words = lower.split(/[^a-z0-9]+/);
  const n = NMOS_STEM.test(lower) || words.includes('n');
  const p = PMOS_STEM.test(lower) || words.includes('p');
  if (n === p) return null;
  return n ? 'nmos' : 'pmos';
}

/** Terminal counts each stand-in accepts: d g s [b]; anode cathode; a b [body]. */
export const STAND_IN_TERMINALS: Readonly<Record<StandIn, readonly number[]>> = {
  nmos: [3, 4],
  pmos: [3, 4],
  diode: [2],
  short: [2, 3],
};

/**
 * The rule for an undefined subcircuit with no explicit mapping: four terminals and a `w` or `l`
 * with a name that says NMOS or PMOS; a subcircuit named `short` (a CDL zero-ohm link, two nets and
 * optionally a body); two terminals and a name with `diode` or `antenna` (a protection diode).
 */
export function standInByRule(
  subckt: string,
  terminals: number,
  params: ReadonlyMap<string, string>,
): StandIn | null {
  const lower = subckt.toLowerCase();
  if (terminals === 4 && (params.has('w') || params.has('l'))) return mosTypeFromName(lower);
  if (lower === 'short' && (terminals === 2 || terminals === 3)) return 'short';
  if (terminals === 2 && /diode|antenna/.test(lower)) return 'diode';
  return null;
}

/** Parses `NAME=KIND` pairs (the `--treat-as` option and the `* railwise: treat-as` directive). */
export function parseStandIns(text: string): { map: Map<string, StandIn>; bad: string | null } {
  const map = new Map<string, StandIn>();
  for (const pair of text.split(/[\s,]+/).filter((p) => p !== '')) {
    const [name, kind] = pair.split('=');
    const standIn = STAND_INS.find((k) => k === kind?.toLowerCase());
    if (name === undefined || name === '' || standIn === undefined) return { map, bad: pair };
    map.set(name.toLowerCase(), standIn);
  }
  return { map, bad: null };
}
