/**
 * The `.model` cards of a SPICE export (docs/semantics.md §1, "Model cards"): the technology's own
 * level-1 values as one card per type, named by a `* railwise: technology` line so that reading the
 * file back fills the technology rather than giving every device a card; then the cards that
 * devices name, with the values each gives. Numbers are written so they read back exactly.
 */
import type { MosDevice, MosKind, Netlist } from '../model/netlist.ts';
import {
  MODEL_FIELDS,
  modelCard,
  technologyValue,
  type DeviceModel,
  type ModelField,
  type Technology,
} from '../model/technology.ts';
import { CARD_KEYS } from './spiceModels.ts';
import { formatSpiceNumber, spiceValue } from './spiceNumber.ts';

export const NMOS_MODEL = 'rw_nmos';
export const PMOS_MODEL = 'rw_pmos';

export interface ExportCards {
  /** The technology line and the card lines. */
  readonly lines: readonly string[];
  /** The card name a transistor's line gives. */
  readonly modelOf: (d: MosDevice) => string;
}

/** `token` makes a name safe for SPICE (the exporter's own rule). */
export function modelCards(netlist: Netlist, tech: Technology, token: (name: string) => string): ExportCards {
  const used = new Map<string, DeviceModel>();
  for (const d of netlist.devices) {
    if (d.kind !== 'nmos' && d.kind !== 'pmos') continue;
    const card = modelCard(tech, d.model);
    if (d.model !== undefined && card?.type === d.kind) used.set(d.model, card);
  }
  const taken = new Set([...used.keys()].map((n) => token(n).toLowerCase()));
  const own: Record<MosKind, string> = {
    nmos: freeName(NMOS_MODEL, taken),
    pmos: freeName(PMOS_MODEL, taken),
  };
  const lines = [
    `* railwise: technology ${own.nmos} ${own.pmos}`,
    cardLine(own.nmos, technologyCard(tech, 'nmos')),
    cardLine(own.pmos, technologyCard(tech, 'pmos')),
    ...[...used].map(([name, card]) => cardLine(token(name), card)),
  ];
  return {
    lines,
    modelOf: (d) => (d.model !== undefined && used.has(d.model) ? token(d.model) : own[d.kind]),
  };
}

/** A card name no device's card already takes (compared as SPICE does, without case). */
function freeName(base: string, taken: ReadonlySet<string>): string {
  let name = base;
  for (let k = 2; taken.has(name); k++) name = `${base}_${k}`;
  return name;
}

function technologyCard(tech: Technology, type: MosKind): DeviceModel {
  const values = Object.fromEntries(MODEL_FIELDS.map((f) => [f, technologyValue(tech, type, f)]));
  return { type, ...values };
}

function cardLine(name: string, card: DeviceModel): string {
  const params = MODEL_FIELDS.flatMap((field) => {
    const value = card[field];
    return value === undefined ? [] : [`${CARD_KEYS[field]}=${cardNumber(field, card.type, value)}`];
  });
  return `.model ${name} ${card.type} (${['level=1', ...params].join(' ')})`;
}

/** Volts and plain figures as written (0.43), k' with a scale factor (115u); −VTO for PMOS. */
function cardNumber(field: ModelField, type: MosKind, value: number): string {
  const v = field === 'vt0' && type === 'pmos' ? 0 - value : value;
  if (field === 'kp') return formatSpiceNumber(v);
  return spiceValue(String(v)) === v ? String(v) : formatSpiceNumber(v);
}
