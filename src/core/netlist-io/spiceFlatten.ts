/**
 * Flattens one cell: every `X` instance is replaced by the contents of its subcircuit, with device
 * and net names prefixed by the instance path (`X1/X2/M3`, `X1/n5`). Rails, `0`, `.global` nets and
 * names ending in `!` are global and keep their name at every depth.
 */
import type { Device, MosDevice } from '../model/netlist.ts';
import type { Body, SpiceFile, Subckt } from './spiceParse.ts';
import type { InstanceElement, MosElement, SourceElement } from './spiceElements.ts';
import { SpiceImportError } from './spiceErrors.ts';
import { spiceValue } from './spiceNumber.ts';

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
}

export interface FlattenContext {
  readonly file: SpiceFile;
  readonly fileName: string;
  /** True for a lower-case net name that is global (rails and `.global` nets). */
  readonly isGlobal: (lower: string) => boolean;
}

interface Scope {
  readonly prefix: string;
  /** Lower-case local port name → net in the enclosing scope. */
  readonly ports: ReadonlyMap<string, string>;
  /** Subcircuits being expanded, outermost first, to catch recursion. */
  readonly stack: readonly string[];
}

/** Widths or lengths this large mean a missing `u` (W=1 read as one metre). */
const IMPLAUSIBLE_MICRONS = 1e4;

class CellBuilder {
  readonly devices: Device[] = [];
  readonly sources: FlatSource[] = [];
  readonly notes: string[] = [];
  private readonly byLower = new Map<string, string>();
  readonly ignoredParams = new Set<string>();
  readonly folded: string[] = [];
  readonly sized: string[] = [];

  constructor(readonly ctx: FlattenContext) {}

  net(local: string, scope: Scope): string {
    const lower = local.toLowerCase();
    const port = scope.ports.get(lower);
    if (port !== undefined) return port;
    const full = this.ctx.isGlobal(lower) ? local : `${scope.prefix}${local}`;
    const key = full.toLowerCase();
    const known = this.byLower.get(key);
    if (known !== undefined) return known;
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

/** Flattens a body; `ports` are the cell's own port names (registered first, in order). */
export function flattenCell(body: Body, ports: readonly string[], ctx: FlattenContext): FlatCell {
  const b = new CellBuilder(ctx);
  const root: Scope = { prefix: '', ports: new Map(), stack: [] };
  ports.forEach((p) => b.net(p, root));
  expandBody(b, body, root);
  if (b.ignoredParams.size > 0)
    b.notes.push(`instance parameters ignored: ${[...b.ignoredParams].sort().join(', ')}`);
  if (b.folded.length > 0) b.notes.push(`m= folded into W as parallel devices: ${b.folded.join(', ')}`);
  if (b.sized.length > 0) b.notes.push(`no W or L given, 1 µm / 0.25 µm assumed: ${b.sized.join(', ')}`);
  return { devices: b.devices, sources: b.sources, nets: b.nets, notes: b.notes };
}

function expandBody(b: CellBuilder, body: Body, scope: Scope): void {
  if (body.error) throw body.error;
  for (const e of body.elements) {
    const name = `${scope.prefix}${e.name}`;
    switch (e.kind) {
      case 'mos':
        b.devices.push(mosDevice(b, e, name, scope));
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
      case 'diode':
        b.devices.push({
          kind: 'diode',
          name,
          anode: b.net(e.anode, scope),
          cathode: b.net(e.cathode, scope),
        });
        break;
      case 'source':
        b.sources.push(flatSource(b, e, name, scope));
        break;
      case 'instance':
        expandInstance(b, e, scope);
        break;
    }
  }
}

function flatSource(b: CellBuilder, e: SourceElement, name: string, scope: Scope): FlatSource {
  return { name, line: e.line, plus: b.net(e.plus, scope), minus: b.net(e.minus, scope), volts: e.volts };
}

function expandInstance(b: CellBuilder, x: InstanceElement, scope: Scope): void {
  const lower = x.subckt.toLowerCase();
  const sub: Subckt | undefined = b.ctx.file.subckts.find((s) => s.name.toLowerCase() === lower);
  if (sub === undefined) b.fail(x.line, `${x.name}: subcircuit ${x.subckt} is not defined in this file`);
  if (scope.stack.includes(sub.name)) b.fail(x.line, `${x.name}: subcircuit ${sub.name} instantiates itself`);
  if (x.nets.length !== sub.ports.length) {
    b.fail(
      x.line,
      `${x.name}: ${x.nets.length} nets given, subcircuit ${sub.name} has ${sub.ports.length} ports (line ${sub.line})`,
    );
  }
  x.ignoredParams.forEach((p) => b.ignoredParams.add(p));
  const ports = new Map(sub.ports.map((p, i) => [p.toLowerCase(), b.net(x.nets[i] as string, scope)]));
  expandBody(b, sub, { prefix: `${scope.prefix}${x.name}/`, ports, stack: [...scope.stack, sub.name] });
}

function mosDevice(b: CellBuilder, e: MosElement, name: string, scope: Scope): MosDevice {
  const kind = mosKind(b, e);
  let w = micronsParam(b, e, 'w');
  const l = micronsParam(b, e, 'l');
  if (!e.params.has('w') || !e.params.has('l')) b.sized.push(name);
  const mText = e.params.get('m');
  if (mText !== undefined) {
    const m = spiceValue(mText);
    if (m === null || !(m > 0)) b.fail(e.line, `${e.name}: m=${mText} is not a positive multiplier`);
    if (m !== 1) b.folded.push(name);
    w *= m;
  }
  for (const key of e.params.keys()) if (key !== 'w' && key !== 'l' && key !== 'm') b.ignoredParams.add(key);
  const device = {
    kind,
    name,
    gate: b.net(e.gate, scope),
    drain: b.net(e.drain, scope),
    source: b.net(e.source, scope),
    w,
    l,
  };
  return e.bulk === undefined ? device : { ...device, bulk: b.net(e.bulk, scope) };
}

function micronsParam(b: CellBuilder, e: MosElement, key: 'w' | 'l'): number {
  const text = e.params.get(key);
  if (text === undefined) return key === 'w' ? 1 : 0.25;
  const microns = spiceValue(text, -6);
  if (microns === null || !(microns > 0))
    b.fail(e.line, `${e.name}: ${key.toUpperCase()}=${text} is not a positive length`);
  if (microns >= IMPLAUSIBLE_MICRONS) {
    b.fail(
      e.line,
      `${e.name}: ${key.toUpperCase()}=${text} is ${microns / 1e6} m; lengths are in metres, write ${text}u for µm`,
    );
  }
  return microns;
}

/** From the model card; failing that, from the model's name (nch, pfet, …). */
function mosKind(b: CellBuilder, e: MosElement): 'nmos' | 'pmos' {
  const lower = e.model.toLowerCase();
  const models = b.ctx.file.models;
  // Binned model sets name their bins `nch.1`, `nch.2`…; any bin gives the type.
  const card = models.get(lower) ?? [...models].find(([k]) => k.startsWith(`${lower}.`))?.[1];
  if (card !== undefined) {
    if (card.type === 'nmos' || card.type === 'pmos') return card.type;
    b.fail(
      e.line,
      `${e.name}: model ${e.model} is a ${card.type} model (line ${card.line}), not nmos or pmos`,
    );
  }
  if (/pmos|pch|pfet/.test(lower)) return 'pmos';
  if (/nmos|nch|nfet/.test(lower)) return 'nmos';
  return b.fail(
    e.line,
    `${e.name}: cannot tell whether model ${e.model} is nmos or pmos; add ".model ${e.model} nmos" (or pmos)`,
  );
}
