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
import type { Body } from './spiceParse.ts';
import type { Element, InstanceElement, SourceElement } from './spiceElements.ts';
import { CellBuilder, type FlatSource, type FlattenContext, type Scope } from './spiceCellBuilder.ts';
import { instanceDevice, mosDevice } from './spiceDevices.ts';
import { joinShorts } from './spiceShorts.ts';
import { nameRecord } from '../model/records.ts';

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
