/**
 * Reads one subcircuit (or the flat top level) into a body of its own: its devices, the instances of
 * the subcircuits it places, its `V` lines and its nets, nothing expanded (docs/semantics.md §6;
 * flattening is the analysis' job, `core/hierarchy/flatten.ts`). Net names match case-blind and
 * keep the first spelling; rails, `0`, `.global` nets and names ending in `!` keep one spelling in
 * the whole file, so they join across instances. Instances of subcircuits the file does not define
 * stand for devices by the rules of `deviceNames.ts`; `short` links join their nets
 * (`spiceShorts.ts`).
 */
import type { Instance } from '../model/design.ts';
import type { Device } from '../model/netlist.ts';
import type { DeviceModel } from '../model/technology.ts';
import type { Body, SpiceFile } from './spiceParse.ts';
import type { Element, InstanceElement, SourceElement } from './spiceElements.ts';
import { SpiceImportError } from './spiceErrors.ts';
import type { Scale } from './spiceScale.ts';
import type { StandIn } from './deviceNames.ts';
import { instanceDevice, mosDevice, type DeviceNotes, type ModelUse } from './spiceDevices.ts';
import { joinShorts, type ShortLink } from './spiceShorts.ts';
import { nameRecord } from '../model/records.ts';

/** A `V` line with its nets resolved in its body. */
export interface FlatSource {
  readonly name: string;
  readonly line: number;
  readonly plus: string;
  readonly minus: string;
  readonly volts: number;
}

/** One subcircuit as read: nothing of the subcircuits it places is copied in. */
export interface BodyCell {
  readonly devices: Device[];
  readonly instances: Instance[];
  readonly sources: FlatSource[];
  /** Every net in order of first appearance (ports first), spelled as first written. */
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
  /** The one spelling of each global net in the file, by lower case (filled as bodies are read). */
  readonly globalSpelling: Map<string, string>;
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
  readonly instances: Instance[] = [];
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
    const full = info.global ? this.globalName(info.lower, local) : scope.prefix + local;
    this.byLower.set(key, full);
    return full;
  }

  /** How a subcircuit's port is spelled as a net of that subcircuit (globals have one spelling). */
  portName(port: string): string {
    const lower = port.toLowerCase();
    return this.ctx.isGlobal(lower) ? this.globalName(lower, port) : port;
  }

  private globalName(lower: string, local: string): string {
    const known = this.ctx.globalSpelling.get(lower);
    if (known !== undefined) return known;
    this.ctx.globalSpelling.set(lower, local);
    return local;
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

/** Reads a body; `ports` are the cell's own port names (registered first, in order). */
export function readBody(body: Body, ports: readonly string[], ctx: FlattenContext): BodyCell {
  if (body.error) throw body.error;
  const b = new CellBuilder(ctx);
  const root: Scope = { prefix: '', lowerPrefix: '', ports: new Map() };
  ports.forEach((p) => b.net(p, root));
  const unwired = unwiredPins(body);
  for (const e of body.elements) {
    if (e.kind !== 'instance') addElement(b, e, root);
    else place(b, e, root, unwired.get(e.name));
  }
  const joined = joinShorts(b, new Set(ports.map((p) => p.toLowerCase())));
  return { ...joined, notes: [...b.notes.lines(), ...joined.notes], models: b.models };
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

/**
 * `* railwise: unwired XNAME PORT…`: pins our export had to give a net although the design leaves
 * them unwired (an open pin, or a rail joined by name); they are read as unwired again.
 */
function unwiredPins(body: Body): Map<string, Set<string>> {
  const out = new Map<string, Set<string>>();
  for (const d of body.directives) {
    if (d.key !== 'unwired') continue;
    const [instance, ...ports] = d.value.split(/\s+/).filter(Boolean);
    if (instance === undefined) continue;
    const set = out.get(instance) ?? new Set<string>();
    ports.forEach((p) => set.add(p.toLowerCase()));
    out.set(instance, set);
  }
  return out;
}

/**
 * An instance of a defined subcircuit, its pins by the subcircuit's port names (less those the
 * file marks unwired); else a stand-in device.
 */
function place(b: CellBuilder, x: InstanceElement, scope: Scope, unwired?: ReadonlySet<string>): void {
  const sub = b.ctx.file.subcktByName.get(x.subckt.toLowerCase());
  if (sub === undefined) {
    instanceDevice(b, x, scope);
    return;
  }
  if (x.nets.length !== sub.ports.length) {
    b.fail(
      x.line,
      `${x.name}: ${x.nets.length} nets given, subcircuit ${sub.name} has ${sub.ports.length} ports (line ${sub.line})`,
    );
  }
  x.params.forEach((_, p) => b.notes.ignoredParams.add(p));
  const pins = nameRecord<string>(); // a pin may be called __proto__
  sub.ports.forEach((p, i) => {
    if (unwired?.has(p.toLowerCase()) !== true) pins[b.portName(p)] = b.net(x.nets[i] as string, scope);
  });
  b.instances.push({ name: x.name, cell: sub.name, pins });
}
