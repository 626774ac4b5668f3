/**
 * Level-1 values from SPICE `.model` cards (docs/semantics.md §1, "Model cards"): `level` (1 when
 * absent, as in SPICE), `vto`, `kp`, `gamma`, `phi` and `lambda`, each a SPICE number checked
 * against its range (`valueRanges.ts`). A card of another level is not read: a note says so and its
 * devices take the technology's values. Only the cards that devices name are read.
 */
import type { MosKind } from '../model/netlist.ts';
import { MODEL_FIELDS, type DeviceModel, type ModelField } from '../model/technology.ts';
import { SpiceImportError } from './spiceErrors.ts';
import type { Directive, ModelCard, SpiceFile } from './spiceParse.ts';
import { spiceValue } from './spiceNumber.ts';
import { rangeProblem, type RangedField } from './valueRanges.ts';

/** A card that cannot be read: a word that is no parameter, a value that is no number or out of range. */
export class ModelCardError extends Error {
  override readonly name = 'ModelCardError';
}

/** The card parameter behind each field of `DeviceModel`. */
export const CARD_KEYS: Readonly<Record<ModelField, RangedField>> = {
  vt0: 'vto',
  kp: 'kp',
  gamma: 'gamma',
  phi: 'phi',
  lambda: 'lambda',
};

const READ_KEYS = new Set<string>(['level', ...Object.values(CARD_KEYS)]);

export interface CardReading {
  /** Null for a card of another level. */
  readonly model: DeviceModel | null;
  /** What the user should know: another level, fields left to the technology, parameters not read. */
  readonly notes: readonly string[];
}

/** Reads a MOS card of `type`; throws ModelCardError naming the card and the parameter. */
export function readLevel1Card(card: ModelCard, type: MosKind): CardReading {
  const [word] = card.stray;
  if (word !== undefined)
    throw new ModelCardError(`.model ${card.name}: "${word}" is not a parameter (write key=value)`);
  const where = `model ${card.name} (line ${card.line})`;
  const level = cardLevel(card);
  if (level !== 1) {
    const note = `${where} is level ${level}: only level-1 cards are read, so its devices take the technology's level-1 values`;
    return { model: null, notes: [note] };
  }
  const values: Partial<Record<ModelField, number>> = {};
  for (const field of MODEL_FIELDS) {
    const key = CARD_KEYS[field];
    const text = card.params.get(key);
    if (text === undefined) continue;
    const value = cardNumber(card, key, text);
    // The technology keeps a PMOS threshold as the magnitude of an enhancement device's VTO.
    values[field] = field === 'vt0' && type === 'pmos' ? 0 - value : value;
  }
  return { model: { type, ...values }, notes: cardNotes(card, where, values) };
}

function cardLevel(card: ModelCard): number {
  const text = card.params.get('level');
  return text === undefined ? 1 : cardNumber(card, 'level', text);
}

function cardNumber(card: ModelCard, key: RangedField | 'level', text: string): number {
  const value = spiceValue(text);
  if (value === null) throw new ModelCardError(`.model ${card.name}: ${key}=${text} is not a number`);
  const problem = key === 'level' ? null : rangeProblem(key, value);
  if (problem !== null) throw new ModelCardError(`.model ${card.name}: ${key}=${text} ${problem}`);
  return value;
}

function cardNotes(card: ModelCard, where: string, values: Partial<Record<ModelField, number>>): string[] {
  const missing = MODEL_FIELDS.filter((f) => values[f] === undefined).map((f) => CARD_KEYS[f]);
  const unread = [...card.params.keys()].filter((k) => !READ_KEYS.has(k)).sort();
  const notes: string[] = [];
  if (missing.length > 0)
    notes.push(`${where} gives no ${missing.join(', ')}: the technology's values are used`);
  if (unread.length > 0)
    notes.push(
      `${where}: ${unread.join(', ')} not read (the level-1 DC model reads vto, kp, gamma, phi, lambda)`,
    );
  return notes;
}

/** The cards `* railwise: technology NAME …` lines name: their values are the technology's own. */
export interface TechnologyCards {
  /** Lower-case card names; devices naming them carry no card. */
  readonly names: ReadonlySet<string>;
  /** At most one card per type, level 1. */
  readonly models: readonly DeviceModel[];
  readonly notes: readonly string[];
}

/** Reads the technology lines; a problem throws SpiceImportError at the line of the directive or card. */
export function technologyCards(
  file: SpiceFile,
  fileName: string,
  directives: readonly Directive[],
): TechnologyCards {
  const names = new Set<string>();
  const byType = new Map<MosKind, { model: DeviceModel; line: number }>();
  const notes: string[] = [];
  for (const d of directives.filter((x) => x.key === 'technology')) {
    for (const name of d.value.split(/[\s,]+/).filter((n) => n !== '')) {
      const fail = (line: number, detail: string): never => {
        throw new SpiceImportError(fileName, line, detail);
      };
      const card =
        file.models.get(name.toLowerCase()) ?? fail(d.line, `technology: no .model card named ${name}`);
      if (card.type !== 'nmos' && card.type !== 'pmos')
        fail(d.line, `technology: ${name} is a ${card.type} model (line ${card.line}), not nmos or pmos`);
      const type = card.type as MosKind;
      const earlier = byType.get(type);
      if (earlier !== undefined)
        fail(
          d.line,
          `technology: two ${type} cards (the other on line ${earlier.line}); name one of each type`,
        );
      const reading = readCard(card, type, fail);
      names.add(card.name.toLowerCase());
      notes.push(...reading.notes);
      if (reading.model !== null) byType.set(type, { model: reading.model, line: d.line });
    }
  }
  return { names, models: [...byType.values()].map((t) => t.model), notes };
}

/** A card's reading, or `fail` at the card's line with what is wrong. */
export function readCard(
  card: ModelCard,
  type: MosKind,
  fail: (line: number, detail: string) => never,
): CardReading {
  try {
    return readLevel1Card(card, type);
  } catch (error) {
    if (error instanceof ModelCardError) return fail(card.line, error.message);
    throw error;
  }
}
