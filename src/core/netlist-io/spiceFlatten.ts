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
import type { Body } from './spiceParse.ts';
import type { Element, InstanceElement, SourceElement } from './spiceElements.ts';
import { CellBuilder, type FlatSource, type FlattenContext, type Scope } from './spiceCellBuilder.ts';
import { instanceDevice, mosDevice } from './spiceDevices.ts';
import { joinShorts } from './spiceShorts.ts';

export interface FlatCell {
  readonly devices: Device[];
  readonly sources: FlatSource[];
  /** Every net in order of first appearance, spelled as first written. */
  readonly nets: string[];
  readonly notes: string[];
  /** Level-1 values of the cards the devices name, by card name. */
  readonly models: ReadonlyMap<string, DeviceModel>;
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
