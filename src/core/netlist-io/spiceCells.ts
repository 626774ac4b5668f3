/**
 * Turns subcircuits into cells of a design: which nets are rails (by name or by a `V` line), which
 * ports are inputs (those that only reach gates, through instances too) and outputs (the other
 * non-rail ports), and what the `* railwise:` directives inside the cell add (expected functions,
 * pin directions). Each cell keeps the instances it places; the flat netlist the checks read is made
 * by the one design flattener (`core/hierarchy/flatten.ts`), with hierarchical names (`X1.MP`).
 */
import type { Cell } from '../document/design.ts';
import type { Netlist, Rail } from '../model/netlist.ts';
import type { DeviceModel } from '../model/technology.ts';
import type { Body } from './spiceParse.ts';
import { readBody, type BodyCell } from './spiceBodies.ts';
import type { FlattenContext, FlatSource } from './spiceCellBuilder.ts';
import type { Hierarchy } from './spiceHierarchy.ts';
import { SpiceImportError, UnflattenedCellError } from './spiceErrors.ts';
import { flattenCell, HierarchyError } from '../hierarchy/flatten.ts';
import { portUse, GATE, CHANNEL, type NetUse } from './portUse.ts';
import { readExportedNames, restoreExportedNames, restoreInstance } from './spiceRestore.ts';
import { applyPinDirectives, readExpectations } from './spiceDirectives.ts';
import { withInputsReadByExpectations } from './pins.ts';
import { recordOf } from '../model/records.ts';
import { readPlacement } from './placementComments.ts';
import { checkDrawnInstances, symbolProps } from './drawnInstances.ts';
import type { Sheet } from '../sheet/types.ts';

export interface ImportedCell {
  readonly name: string;
  /** Flat: every instance expanded, devices and nets named by their instance path. */
  readonly netlist: Netlist;
  /** Expected functions from `* railwise: expect Y = …` lines, by output. */
  readonly expectations: Readonly<Record<string, string>>;
  /** Line of the `* railwise: expect` directive of each expected function, by output. */
  readonly expectationLines: Readonly<Record<string, number>>;
  /** True when `* railwise: inputs` or `outputs` lines named the pins. */
  readonly pinsNamed: boolean;
  /** Level-1 values of the model cards the devices name (`MosDevice.model`), by card name. */
  readonly models: Readonly<Record<string, DeviceModel>>;
  /** The drawing a Railwise export carried (placementComments.ts), when it still fits the netlist. */
  readonly sheet?: Sheet;
  readonly notes: readonly string[];
  /** The cell and every cell it places, as a design holds them (the cell itself last). */
  readonly cells: readonly Cell[];
}

export interface CellContext extends FlattenContext {
  /** Role of a net by its name, or null. */
  readonly railRole: (net: string) => Rail['role'] | null;
  readonly hierarchy: Hierarchy;
  /** Bodies read so far and cells finished so far, so each subcircuit is read once per file. */
  readonly bodies: Map<Body, BodyCell>;
  readonly finished: Map<Body, FinishedCell>;
  readonly uses: Map<Body, NetUse>;
  /** Each subcircuit's cell name as restored, by its lower-case name in the file. */
  readonly cellNames: ReadonlyMap<string, string>;
}

export interface CellSpec {
  readonly name: string;
  readonly body: Body;
  /** The subcircuit's ports; null for a flat netlist at the top level, which has none. */
  readonly ports: readonly string[] | null;
  /** Extra `V` lines that apply (those at the top level of a library). */
  readonly sharedSources: readonly FlatSource[];
  /** Where the cell starts, for errors about the cell as a whole. */
  readonly line: number;
}

interface FinishedCell {
  readonly cell: Cell;
  readonly expectationLines: Readonly<Record<string, number>>;
  readonly pinsNamed: boolean;
  readonly notes: readonly string[];
  /** The cell's nets as the design names them, from the names the file spells. */
  readonly net: (name: string) => string;
  readonly models: ReadonlyMap<string, DeviceModel>;
}

export function buildCell(spec: CellSpec, ctx: CellContext): ImportedCell {
  ctx.hierarchy.check(spec.name, spec.body, spec.line);
  const placed = placedBodies(spec.body, ctx);
  const finished = [...placed.map((b) => finish(subSpec(b, spec), ctx)), finish(spec, ctx)];
  const cells = finished.map((f) => f.cell);
  const top = finished[finished.length - 1] as FinishedCell;
  let netlist: Netlist;
  try {
    netlist = flattenCell(new Map(cells.map((c) => [c.name, c])), top.cell.name);
  } catch (e) {
    if (e instanceof HierarchyError)
      throw new UnflattenedCellError(ctx.fileName, spec.line, e.message, cells);
    throw e;
  }
  const notes = [...new Set(finished.flatMap((f) => f.notes))];
  const diodes = netlist.devices.filter((d) => d.kind === 'diode').map((d) => d.name);
  if (diodes.length > 0)
    notes.push(`protection diodes kept, never conducting in steady state: ${diodes.join(', ')}`);
  const { name, expectations } = top.cell;
  const { expectationLines, pinsNamed } = top;
  const models = recordOf(finished.flatMap((f) => [...f.models]));
  const { sheet } = top.cell;
  const drawn = sheet === undefined ? {} : { sheet };
  return { name, netlist, expectations, expectationLines, pinsNamed, models, ...drawn, notes, cells };
}

/** The level-1 values of every card a device of any cell read so far names, by card name. */
export function cardsNamed(ctx: CellContext): Record<string, DeviceModel> {
  return recordOf([...ctx.finished.values()].flatMap((f) => [...f.models]));
}

function subSpec(body: Body, root: CellSpec): CellSpec {
  const sub = body as Body & { name: string; ports: readonly string[]; line: number };
  return { name: sub.name, body, ports: sub.ports, sharedSources: root.sharedSources, line: sub.line };
}

function readOnce(body: Body, ports: readonly string[], ctx: CellContext): BodyCell {
  let read = ctx.bodies.get(body);
  if (read === undefined) {
    read = readBody(body, ports, ctx);
    ctx.bodies.set(body, read);
  }
  return read;
}

/** Every subcircuit the body places, directly or deeper, children before the cells that place them. */
function placedBodies(root: Body, ctx: CellContext): Body[] {
  const order: Body[] = [];
  const seen = new Set<Body>([root]);
  const stack: { body: Body; children: Body[]; next: number }[] = [];
  const push = (body: Body): void => {
    const read = readOnce(body, 'ports' in body ? (body.ports as string[]) : [], ctx);
    const children = read.instances.map((i) => ctx.file.subcktByName.get(i.cell.toLowerCase()) as Body);
    stack.push({ body, children, next: 0 });
  };
  push(root);
  while (stack.length > 0) {
    const f = stack[stack.length - 1] as (typeof stack)[number];
    const child = f.children[f.next++];
    if (child === undefined) {
      stack.pop();
      if (f.body !== root) order.push(f.body);
    } else if (!seen.has(child)) {
      seen.add(child);
      push(child);
    }
  }
  return order;
}

/** One cell finished: rails, pins, directives; each body once per file. */
function finish(spec: CellSpec, ctx: CellContext): FinishedCell {
  const known = ctx.finished.get(spec.body);
  if (known !== undefined) return known;
  const read = readOnce(spec.body, spec.ports ?? [], ctx);
  const rails = cellRails(read.nets, [...spec.sharedSources, ...read.sources], ctx);
  const railNets = new Set(rails.map((r) => r.net));
  const notes = [...read.notes];
  const byLower = new Map(read.nets.map((n) => [n.toLowerCase(), n]));
  const resolveNet = (name: string): string => byLower.get(name.toLowerCase()) ?? name;
  const ports = (spec.ports ?? read.nets).map(resolveNet).filter((p) => !railNets.has(p));
  const pins = inferPins(portUse(spec.body, read, ctx), ports, spec.ports === null);
  if (spec.ports === null && pins.outputs.length > 0) {
    notes.push(
      `a flat netlist has no ports: outputs taken as the nets that reach no gate (${pins.outputs.join(', ')})`,
    );
  }
  let netlist: Netlist = { name: spec.name, devices: read.devices, rails, ...pins };
  netlist = applyPinDirectives(netlist, spec.body.directives, ctx.fileName);
  const { expectations, lines } = readExpectations(netlist, spec.body.directives, notes);
  const pinsNamed = spec.body.directives.some((d) => d.key === 'inputs' || d.key === 'outputs');
  // A port an expected function reads but does not describe is an input (docs/semantics.md §6).
  if (!pinsNamed) netlist = withInputsReadByExpectations(netlist, expectations);
  const parsed = readExportedNames(spec.body.directives, notes, netsOf(read, expectations));
  const names = { ...parsed, cell: ctx.cellNames.get(spec.name.toLowerCase()) ?? spec.name };
  const restored = restoreExportedNames({ netlist, expectations, expectationLines: lines }, names);
  const instances = read.instances.map((i) => restoreInstance(i, names, placedNames(i.cell, ctx)));
  // The drawing a Railwise export carried, when it still derives the cell's own netlist and instances.
  const netlistOf = (name: string): Netlist | undefined => placedNetlist(name, ctx);
  const symbols = symbolProps(instances, netlistOf);
  const drawing = readPlacement(spec.body.directives, restored.netlist, notes, symbols);
  const sheet = checkDrawnInstances(drawing, instances, netlistOf, notes);
  const globals = read.nets.filter((n) => !railNets.has(n) && ctx.isGlobal(n.toLowerCase())).map(names.net);
  const cell: Cell = {
    name: restored.netlist.name,
    netlist: restored.netlist,
    instances,
    expectations: restored.expectations,
    sequences: [],
    ...(globals.length === 0 ? {} : { globals }),
    ...(sheet === null ? {} : { sheet }),
  };
  const { expectationLines } = restored;
  const done = { cell, expectationLines, pinsNamed, notes, net: names.net, models: read.models };
  ctx.finished.set(spec.body, done);
  return done;
}

/** A cell's nets as the file spells them, with those only instances and expected functions name. */
function netsOf(read: BodyCell, expectations: Readonly<Record<string, string>>): string[] {
  const pins = read.instances.flatMap((i) => Object.values(i.pins));
  return [...new Set([...read.nets, ...pins, ...Object.keys(expectations)])];
}

/** How a placed subcircuit's cell is named, and its pins, once it is finished (it always is first). */
function placedNames(subckt: string, ctx: CellContext): { cell: string; net: (name: string) => string } {
  const body = ctx.file.subcktByName.get(subckt.toLowerCase());
  const done = body === undefined ? undefined : ctx.finished.get(body);
  return done === undefined ? { cell: subckt, net: (n) => n } : { cell: done.cell.name, net: done.net };
}

/** The netlist of a cell finished so far, by its name in the design. */
function placedNetlist(cell: string, ctx: CellContext): Netlist | undefined {
  for (const done of ctx.finished.values()) if (done.cell.name === cell) return done.cell.netlist;
  return undefined;
}

/** Rails in order of first appearance: named rails, then nets a `V` line holds. */
function cellRails(nets: readonly string[], sources: readonly FlatSource[], ctx: CellContext): Rail[] {
  const held = new Map<string, Rail>();
  const inCell = new Map(nets.map((n) => [n.toLowerCase(), n]));
  for (const s of sources) {
    const rail = sourceRail(s, ctx);
    const net = inCell.get(rail.net.toLowerCase());
    if (net !== undefined) held.set(net, { ...rail, net });
  }
  const rails: Rail[] = [];
  for (const net of nets) {
    const role = ctx.railRole(net);
    const fromSource = held.get(net);
    if (fromSource !== undefined) rails.push(fromSource);
    else if (role !== null) rails.push({ net, role });
  }
  return rails;
}

/** A `V` line from a net to ground makes that net a supply of that voltage (0 V: a ground). */
function sourceRail(s: FlatSource, ctx: CellContext): Rail {
  const plusGround = ctx.railRole(s.plus) === 'ground';
  const minusGround = ctx.railRole(s.minus) === 'ground';
  if (!plusGround && !minusGround) {
    throw new SpiceImportError(
      ctx.fileName,
      s.line,
      `${s.name}: a V source must run from a net to ground (${s.plus} to ${s.minus})`,
    );
  }
  const [net, volts] = minusGround ? [s.plus, s.volts] : [s.minus, -s.volts];
  if (volts < 0)
    throw new SpiceImportError(
      ctx.fileName,
      s.line,
      `${s.name}: a negative supply (${volts} V) is not supported`,
    );
  if (volts > 0 && ctx.railRole(net) === 'ground') {
    throw new SpiceImportError(
      ctx.fileName,
      s.line,
      `${s.name}: ${net} is a ground by name but this line holds it at ${volts} V`,
    );
  }
  return volts === 0 ? { net, role: 'ground' } : { net, role: 'supply', volts };
}

/**
 * Inputs are ports that reach gates and no channel (drain, source or resistor end), inside placed
 * cells too. The rest are outputs; for a flat netlist, only those that reach no gate (internal nodes
 * cannot be told apart).
 */
function inferPins(use: NetUse, ports: readonly string[], flat: boolean) {
  const has = (p: string, flag: number): boolean => ((use.get(p) ?? 0) & flag) !== 0;
  const inputs = ports.filter((p) => has(p, GATE) && !has(p, CHANNEL));
  const isInput = new Set(inputs);
  const outputs = ports.filter((p) => !isInput.has(p) && (!flat || (has(p, CHANNEL) && !has(p, GATE))));
  return { inputs, outputs };
}
