/**
 * Flattens one cell: every `X` instance is replaced by the contents of its subcircuit, with device
 * and net names prefixed by the instance path (`X1/X2/M3`, `X1/n5`). Rails, `0`, `.global` nets and
 * names ending in `!` are global and keep their name at every depth. The walk keeps its own stack,
 * so depth costs no JavaScript stack; the hierarchy was sized before (`spiceHierarchy.ts`).
 * Instances of subcircuits the file does not define stand for devices by the rules of
 * `deviceNames.ts`; `short` links join their nets afterwards (`spiceShorts.ts`).
 */
import type { Device } from '../model/netlist.ts';
import type { DeviceModel } from '../model/technology.ts';
import type { Body, SpiceFile } from './spiceParse.ts';
import type { Element, InstanceElement, SourceElement } from './spiceElements.ts';
import { SpiceImportError } from './spiceErrors.ts';
import type { Scale } from './spiceScale.ts';
import type { StandIn } from './deviceNames.ts';
import { instanceDevice, mosDevice, type DeviceNotes, type ModelUse } from './spiceDevices.ts';
import { joinShorts, type ShortLink } from './spiceShorts.ts';

/** A `V` line after flattening: its nets resolved. */
export interface FlatSource {
  readonly name: string;
  readonly line: number;
  readonly plus: string;
  readonly minus: string;
  readonly volts: number;
}

export interface FlatCell {
  readonly devices: Device[];
  readonly sources: FlatSource[];
  /** Every net in order of first appearance, spelled as first written. */
  readonly nets: string[];
  readonly notes: string[];
  /** Level-1 values of the cards the devices name, by card name. */
  readonly models: ReadonlyMap<string, DeviceModel>;
}

export interface FlattenContext {
  readonly file: SpiceFile;
  readonly fileName: string;
  /** True for a lower-case net name that is global (rails and `.global` nets). */
  readonly isGlobal: (lower: string) => boolean;
  /** Metres per unit of W and L as written; null for plain SPICE numbers in metres. */
  readonly scale: Scale | null;
  /** Explicit stand-ins for undefined subcircuits, by lower-case name. */
  readonly standIns: ReadonlyMap<string, StandIn>;
  /** Lower-case names of the cards that are the technology's own (`* railwise: technology`). */
  readonly technologyCards: ReadonlySet<string>;
}

export interface Scope {
  readonly prefix: string;
  /** The prefix in lower case, for the case-blind net index. */
  readonly lowerPrefix: string;
  /** Lower-case local port name → net in the enclosing scope. */
  readonly ports: ReadonlyMap<string, string>;
}

export class CellBuilder {
  readonly devices: Device[] = [];
  readonly sources: FlatSource[] = [];
  readonly shorts: ShortLink[] = [];
  readonly notes = new DeviceNotesCollector();
  private readonly byLower = new Map<string, string>();
  /** Local names repeat in every instance: their lower case and whether they are global, once. */
  private readonly locals = new Map<string, { lower: string; global: boolean }>();
  /** Caches for the device readers: what a model name gives and a size text's value, per cell. */
  readonly modelUses = new Map<string, ModelUse>();
  /** The level-1 values of the cards this cell's devices name. */
  readonly models = new Map<string, DeviceModel>();
  readonly sizes = new Map<string, number>();

  constructor(readonly ctx: FlattenContext) {}

  net(local: string, scope: Scope): string {
    let info = this.locals.get(local);
    if (info === undefined) {
      const lower = local.toLowerCase();
      info = { lower, global: this.ctx.isGlobal(lower) };
      this.locals.set(local, info);
    }
    const port = scope.ports.get(info.lower);
    if (port !== undefined) return port;
    const key = info.global ? info.lower : scope.lowerPrefix + info.lower;
    const known = this.byLower.get(key);
    if (known !== undefined) return known;
    const full = info.global ? local : scope.prefix + local;
    this.byLower.set(key, full);
    return full;
  }

  get nets(): string[] {
    return [...this.byLower.values()];
  }

  fail(line: number, detail: string): never {
    throw new SpiceImportError(this.ctx.fileName, line, detail);
  }
}

/** What the device readers tell the user once per cell. */
export class DeviceNotesCollector implements DeviceNotes {
  readonly ignoredParams = new Set<string>();
  readonly folded: string[] = [];
  readonly sized: string[] = [];
  /** Undefined subcircuit → what it was read as, how many, and whether by rule. */
  readonly standIns = new Map<string, { kind: StandIn; count: number; byRule: boolean }>();
  readonly models = new Set<string>();

  lines(): string[] {
    const out: string[] = [];
    if (this.ignoredParams.size > 0)
      out.push(`instance parameters ignored: ${[...this.ignoredParams].sort().join(', ')}`);
    if (this.folded.length > 0) out.push(`m= folded into W as parallel devices: ${this.folded.join(', ')}`);
    if (this.sized.length > 0) out.push(`no W or L given, 1 µm / 0.25 µm assumed: ${this.sized.join(', ')}`);
    if (this.standIns.size > 0) {
      const list = [...this.standIns].map(
        ([name, s]) => `${name} → ${s.kind} ×${s.count}${s.byRule ? '' : ' (as told)'}`,
      );
      out.push(`subcircuits not defined in this file read as devices: ${list.join(', ')}`);
    }
    out.push(...this.models);
    return out;
  }
}

/** Flattens a body; `ports` are the cell's own port names (registered first, in order). */
export function flattenCell(body: Body, ports: readonly string[], ctx: FlattenContext): FlatCell {
  const b = new CellBuilder(ctx);
  const root: Scope = { prefix: '', lowerPrefix: '', ports: new Map() };
  ports.forEach((p) => b.net(p, root));
  expand(b, body, root);
  const joined = joinShorts(b, new Set(ports.map((p) => p.toLowerCase())));
  return { ...joined, notes: [...b.notes.lines(), ...joined.notes], models: b.models };
}

interface Frame {
  readonly body: Body;
  readonly scope: Scope;
  next: number;
}

function expand(b: CellBuilder, body: Body, root: Scope): void {
  if (body.error) throw body.error;
  const stack: Frame[] = [{ body, scope: root, next: 0 }];
  while (stack.length > 0) {
    const f = stack[stack.length - 1] as Frame;
    const e = f.body.elements[f.next++];
    if (e === undefined) stack.pop();
    else if (e.kind !== 'instance') addElement(b, e, f.scope);
    else {
      const child = enter(b, e, f.scope);
      if (child !== null) stack.push(child);
    }
  }
}

function addElement(b: CellBuilder, e: Exclude<Element, InstanceElement>, scope: Scope): void {
  const name = `${scope.prefix}${e.name}`;
  switch (e.kind) {
    case 'mos':
      b.devices.push(mosDevice(b, e, name, scope, null));
      break;
    case 'resistor':
      b.devices.push({ kind: 'resistor', name, a: b.net(e.a, scope), b: b.net(e.b, scope), ohms: e.value });
      break;
    case 'capacitor':
      b.devices.push({
        kind: 'capacitor',
        name,
        a: b.net(e.a, scope),
        b: b.net(e.b, scope),
        farads: e.value,
      });
      break;
    case 'short':
      b.shorts.push({ name, line: e.line, a: b.net(e.a, scope), b: b.net(e.b, scope) });
      break;
    case 'diode':
      b.devices.push({ kind: 'diode', name, anode: b.net(e.anode, scope), cathode: b.net(e.cathode, scope) });
      break;
    case 'source':
      b.sources.push(flatSource(b, e, name, scope));
      break;
  }
}

function flatSource(b: CellBuilder, e: SourceElement, name: string, scope: Scope): FlatSource {
  return { name, line: e.line, plus: b.net(e.plus, scope), minus: b.net(e.minus, scope), volts: e.volts };
}

/** The frame for a defined subcircuit; an undefined one is added as the device it stands for. */
function enter(b: CellBuilder, x: InstanceElement, scope: Scope): Frame | null {
  const sub = b.ctx.file.subcktByName.get(x.subckt.toLowerCase());
  if (sub === undefined) {
    instanceDevice(b, x, scope);
    return null;
  }
  if (sub.error) throw sub.error;
  if (x.nets.length !== sub.ports.length) {
    b.fail(
      x.line,
      `${x.name}: ${x.nets.length} nets given, subcircuit ${sub.name} has ${sub.ports.length} ports (line ${sub.line})`,
    );
  }
  x.params.forEach((_, p) => b.notes.ignoredParams.add(p));
  const ports = new Map(sub.ports.map((p, i) => [p.toLowerCase(), b.net(x.nets[i] as string, scope)]));
  const prefix = `${scope.prefix}${x.name}/`;
  return { body: sub, scope: { prefix, lowerPrefix: prefix.toLowerCase(), ports }, next: 0 };
}
