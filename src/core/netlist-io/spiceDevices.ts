/**
 * Turns a transistor line, or an instance of a subcircuit the file does not define, into a device:
 * the type from a `.model` card or the name (`deviceNames.ts`), W and L in µm under the file's
 * scale, `m` folded into W, and every number checked against its range (`valueRanges.ts`).
 */
import type { MosDevice, MosKind } from '../model/netlist.ts';
import type { InstanceElement, MosElement } from './spiceElements.ts';
import { mosTypeFromName, STAND_IN_TERMINALS, standInByRule } from './deviceNames.ts';
import { spiceValue } from '../units/spiceNumber.ts';
import { scaledMicrons } from './spiceScale.ts';
import { rangeProblem, VALUE_RANGES } from './valueRanges.ts';
import type { CellBuilder, ModelUse, Scope } from './spiceCellBuilder.ts';
import { readCard } from './spiceModels.ts';
import type { ModelCard } from './spiceParse.ts';

/** Widest total width of one device after `m` is folded in, µm (1 m). */
const MAX_FOLDED_WIDTH = 1e6;

export function mosDevice(
  b: CellBuilder,
  e: MosElement,
  name: string,
  scope: Scope,
  kind: MosKind | null,
): MosDevice {
  const use = kind === null ? modelUse(b, e) : { kind };
  const type = use.kind;
  let w = micronsParam(b, e, 'w');
  const l = micronsParam(b, e, 'l');
  if (!e.params.has('w') || !e.params.has('l')) b.notes.sized.push(name);
  const m = multiplier(b, e);
  if (m !== 1) b.notes.folded.push(name);
  w *= m;
  if (w > MAX_FOLDED_WIDTH) b.fail(e.line, `${e.name}: W×m = ${w} µm is wider than 1 m`);
  for (const key of e.params.keys())
    if (key !== 'w' && key !== 'l' && key !== 'm') b.notes.ignoredParams.add(key);
  const nets = { gate: b.net(e.gate, scope), drain: b.net(e.drain, scope), source: b.net(e.source, scope) };
  const bulk = e.bulk === undefined ? undefined : b.net(e.bulk, scope);
  return mosRecord(type, name, nets, w, l, use.model, bulk);
}

/**
 * A MOS device with its optional fields only when given, built field by field in one order (kind,
 * name, gate, drain, source, w, l, model, bulk): V8 gives each object spread a hidden class of its
 * own, which at a million devices costs hundreds of megabytes.
 */
function mosRecord(
  kind: MosKind,
  name: string,
  nets: { readonly gate: string; readonly drain: string; readonly source: string },
  w: number,
  l: number,
  model: string | undefined,
  bulk: string | undefined,
): MosDevice {
  const { gate, drain, source } = nets;
  if (model === undefined)
    return bulk === undefined
      ? { kind, name, gate, drain, source, w, l }
      : { kind, name, gate, drain, source, w, l, bulk };
  return bulk === undefined
    ? { kind, name, gate, drain, source, w, l, model }
    : { kind, name, gate, drain, source, w, l, model, bulk };
}

function multiplier(b: CellBuilder, e: MosElement): number {
  const text = e.params.get('m');
  if (text === undefined) return 1;
  const m = spiceValue(text);
  if (m === null) return b.fail(e.line, `${e.name}: m=${text} is not a number`);
  const problem = rangeProblem('m', m);
  if (problem !== null) b.fail(e.line, `${e.name}: m=${text} ${problem}`);
  return m;
}

function micronsParam(b: CellBuilder, e: MosElement, key: 'w' | 'l'): number {
  const text = e.params.get(key);
  if (text === undefined) return key === 'w' ? 1 : 0.25;
  const cacheKey = key + text;
  const known = b.sizes.get(cacheKey);
  if (known !== undefined) return known;
  const microns = checkedMicrons(b, e, key, text);
  b.sizes.set(cacheKey, microns);
  return microns;
}

function checkedMicrons(b: CellBuilder, e: MosElement, key: 'w' | 'l', text: string): number {
  const field = key.toUpperCase();
  const microns = scaledMicrons(text, b.ctx.scale?.factor ?? 1);
  if (microns === null || !(microns > 0))
    return b.fail(e.line, `${e.name}: ${field}=${text} is not a positive length`);
  if (b.ctx.scale === null && microns >= VALUE_RANGES[key].max)
    b.fail(e.line, `${e.name}: ${field}=${text} ${implausible(text, microns)}`);
  const problem = rangeProblem(key, microns);
  if (problem !== null) b.fail(e.line, `${e.name}: ${field}=${text} (${microns} µm) ${problem}`);
  return microns;
}

/** Advice for a size that reads as a centimetre or more, which is right for the text as written. */
export function implausible(text: string, microns: number): string {
  const metres = Number.isFinite(microns) ? `${microns / 1e6} m` : 'not a finite length';
  const m = /^[+-]?[\d.]+(?:e[+-]?\d+)?([a-zµ]*)$/i.exec(text.trim());
  const letters = (m?.[1] ?? '').toLowerCase();
  if (letters !== '' && !/^(meg|mil|[tgkmuµnpfa])/.test(letters))
    return `is ${metres}: "${letters}" is not a scale factor (f p n u m k meg g t), so it reads as metres; write e.g. 1u for 1 µm`;
  const scale = 'if this file writes sizes under a scale, add ".option scale=1e-6" or give --scale 1e-6';
  if (letters === '') return `is ${metres} (plain numbers are metres): write ${text}u for µm, or ${scale}`;
  return `is ${metres}, more than 1 cm: ${scale}`;
}

/** From the model card; failing that, from the model's name (nch, pfet, …). Once per model a cell. */
function modelUse(b: CellBuilder, e: MosElement): ModelUse {
  const known = b.modelUses.get(e.model);
  if (known !== undefined) return known;
  const use = resolveModel(b, e);
  b.modelUses.set(e.model, use);
  return use;
}

function resolveModel(b: CellBuilder, e: MosElement): ModelUse {
  const lower = e.model.toLowerCase();
  const models = b.ctx.file.models;
  const exact = models.get(lower);
  // Binned model sets name their bins `nch.1`, `nch.2`…; any bin gives the type.
  const card = exact ?? [...models].find(([k]) => k.startsWith(`${lower}.`))?.[1];
  if (card !== undefined) {
    if (card.type !== 'nmos' && card.type !== 'pmos')
      b.fail(
        e.line,
        `${e.name}: model ${e.model} is a ${card.type} model (line ${card.line}), not nmos or pmos`,
      );
    if (exact !== undefined) return cardUse(b, e, exact, card.type);
    b.notes.models.add(
      `model ${e.model} is binned (${card.name}, …): bins are not read, so its devices take the technology's level-1 values`,
    );
    return { kind: card.type };
  }
  return {
    kind:
      mosTypeFromName(lower) ??
      b.fail(
        e.line,
        `${e.name}: cannot tell whether model ${e.model} is nmos or pmos; add ".model ${e.model} nmos" (or pmos)`,
      ),
  };
}

/**
 * A device that names a MOS card takes its level-1 values; the cards a `* railwise: technology`
 * line names are the technology's own, so their devices name no card.
 */
function cardUse(b: CellBuilder, e: MosElement, card: ModelCard, kind: MosKind): ModelUse {
  if (b.ctx.technologyCards.has(card.name.toLowerCase())) return { kind };
  const reading = readCard(card, kind, (line, detail) => b.fail(line, `${e.name} uses ${detail}`));
  reading.notes.forEach((n) => b.notes.models.add(n));
  if (reading.model === null) return { kind };
  b.models.set(card.name, reading.model);
  return { kind, model: card.name };
}

/** An instance of a subcircuit the file does not define: the device it stands for, or a refusal. */
export function instanceDevice(b: CellBuilder, x: InstanceElement, scope: Scope): void {
  const lower = x.subckt.toLowerCase();
  const told = b.ctx.standIns.get(lower);
  const kind = told ?? standInByRule(x.subckt, x.nets.length, x.params);
  if (kind === null) b.fail(x.line, undefinedAdvice(x));
  if (!STAND_IN_TERMINALS[kind].includes(x.nets.length)) {
    const counts = STAND_IN_TERMINALS[kind].join(' or ');
    b.fail(
      x.line,
      `${x.name}: ${x.subckt} is read as ${kind}, which takes ${counts} nets, not ${x.nets.length}`,
    );
  }
  const seen = b.notes.standIns.get(x.subckt) ?? { kind, count: 0, byRule: told === undefined };
  b.notes.standIns.set(x.subckt, { ...seen, count: seen.count + 1 });
  const name = `${scope.prefix}${x.name}`;
  const [first = '', second = '', third = '', fourth] = x.nets;
  if (kind === 'short')
    b.shorts.push({ name, line: x.line, a: b.net(first, scope), b: b.net(second, scope) });
  else if (kind === 'diode')
    b.devices.push({ kind, name, anode: b.net(first, scope), cathode: b.net(second, scope) });
  else {
    const base = {
      kind: 'mos' as const,
      name: x.name,
      line: x.line,
      drain: first,
      gate: second,
      source: third,
    };
    const mos: MosElement = {
      ...base,
      model: x.subckt,
      params: x.params,
      ...(fourth === undefined ? {} : { bulk: fourth }),
    };
    b.devices.push(mosDevice(b, mos, name, scope, kind));
  }
}

function undefinedAdvice(x: InstanceElement): string {
  const base = `${x.name}: subcircuit ${x.subckt} is not defined in this file`;
  const looksMos = x.nets.length === 4 && (x.params.has('w') || x.params.has('l'));
  if (looksMos)
    return `${base}, and its name does not say NMOS or PMOS: give --treat-as ${x.subckt}=nmos (or pmos), or a "* railwise: treat-as ${x.subckt}=nmos" line`;
  return `${base}; define it, or say what it stands for with --treat-as ${x.subckt}=nmos|pmos|diode|short`;
}
