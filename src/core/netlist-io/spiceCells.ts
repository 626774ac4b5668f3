/**
 * Turns one flattened cell into a Netlist: which nets are rails (by name or by a `V` line), which
 * ports are inputs (those that only reach gates) and outputs (the other non-rail ports), and what
 * the `* railwise:` directives inside the cell add (expected functions, pin directions).
 */
import type { Device, Netlist, Rail } from '../model/netlist.ts';
import type { DeviceModel } from '../model/technology.ts';
import type { Body, Directive } from './spiceParse.ts';
import { flattenCell, type FlatCell, type FlattenContext, type FlatSource } from './spiceFlatten.ts';
import type { Hierarchy } from './spiceHierarchy.ts';
import { SpiceImportError } from './spiceErrors.ts';
import { assignPins, PinError, withInputsReadByExpectations } from './pins.ts';
import { restoreExportedNames } from './spiceRestore.ts';
import { readPlacement } from './placementComments.ts';
import type { Sheet } from '../sheet/types.ts';
import { nameRecord, recordOf } from '../model/records.ts';
import { unquoted } from '../format/printable.ts';

export interface ImportedCell {
  readonly name: string;
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
}

export interface CellContext extends FlattenContext {
  /** Role of a net by its name, or null. */
  readonly railRole: (net: string) => Rail['role'] | null;
  readonly hierarchy: Hierarchy;
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

export function buildCell(spec: CellSpec, ctx: CellContext): ImportedCell {
  ctx.hierarchy.check(spec.name, spec.body, spec.line);
  const flat = flattenCell(spec.body, spec.ports ?? [], ctx);
  const rails = cellRails(flat, spec.sharedSources, ctx);
  const railNets = new Set(rails.map((r) => r.net));
  const notes = [...flat.notes];
  const byLower = new Map(flat.nets.map((n) => [n.toLowerCase(), n]));
  const resolveNet = (name: string): string => byLower.get(name.toLowerCase()) ?? name;
  const ports = (spec.ports ?? topLevelPorts(flat)).map(resolveNet).filter((p) => !railNets.has(p));
  const pins = inferPins(flat.devices, ports, spec.ports === null);
  if (spec.ports === null && pins.outputs.length > 0) {
    notes.push(
      `a flat netlist has no ports: outputs taken as the nets that reach no gate (${pins.outputs.join(', ')})`,
    );
  }
  const diodes = flat.devices.filter((d) => d.kind === 'diode').map((d) => d.name);
  if (diodes.length > 0)
    notes.push(`protection diodes kept, never conducting in steady state: ${diodes.join(', ')}`);
  let netlist: Netlist = { name: spec.name, devices: flat.devices, rails, ...pins };
  netlist = applyPinDirectives(netlist, spec.body.directives, ctx.fileName);
  const { expectations, lines } = readExpectations(netlist, spec.body.directives, notes);
  const pinsNamed = spec.body.directives.some((d) => d.key === 'inputs' || d.key === 'outputs');
  if (!pinsNamed) netlist = withInputsReadByExpectations(netlist, expectations);
  const models = recordOf(flat.models);
  const restored = restoreExportedNames(
    { netlist, expectations, expectationLines: lines },
    spec.body.directives,
    notes,
  );
  const sheet = readPlacement(spec.body.directives, restored.netlist, notes);
  return { name: restored.netlist.name, ...restored, pinsNamed, models, ...(sheet ? { sheet } : {}), notes };
}

/** Rails in order of first appearance: named rails, then nets a `V` line holds. */
function cellRails(flat: FlatCell, shared: readonly FlatSource[], ctx: CellContext): Rail[] {
  const held = new Map<string, Rail>();
  const inCell = new Map(flat.nets.map((n) => [n.toLowerCase(), n]));
  for (const s of [...shared, ...flat.sources]) {
    const rail = sourceRail(s, ctx);
    const net = inCell.get(rail.net.toLowerCase());
    if (net !== undefined) held.set(net, { ...rail, net });
  }
  const rails: Rail[] = [];
  for (const net of flat.nets) {
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

/** A flat netlist's candidate pins: the nets of the top level itself, not inside an instance. */
function topLevelPorts(flat: FlatCell): string[] {
  return flat.nets.filter((n) => !n.includes('/'));
}

/**
 * Inputs are ports that reach gates and no channel (drain, source or resistor end). The rest are
 * outputs; for a flat netlist, only those that reach no gate (internal nodes cannot be told apart).
 */
function inferPins(devices: readonly Device[], ports: readonly string[], flat: boolean) {
  const gates = new Set<string>();
  const channels = new Set<string>();
  for (const d of devices) {
    if (d.kind === 'nmos' || d.kind === 'pmos') {
      gates.add(d.gate);
      channels.add(d.drain).add(d.source);
    } else if (d.kind === 'resistor') channels.add(d.a).add(d.b);
  }
  const inputs = ports.filter((p) => gates.has(p) && !channels.has(p));
  const isInput = new Set(inputs);
  const outputs = ports.filter((p) => !isInput.has(p) && (!flat || (channels.has(p) && !gates.has(p))));
  return { inputs, outputs };
}

/**
 * `inputs` and `outputs` lines of one cell apply together, so a net named in both is a pin that is
 * driven and observed (a bidirectional pin), as our export writes it.
 */
function applyPinDirectives(netlist: Netlist, directives: readonly Directive[], fileName: string): Netlist {
  const pins = directives.filter((d) => d.key === 'inputs' || d.key === 'outputs');
  const listed = (key: 'inputs' | 'outputs'): string[] | undefined => {
    const lines = pins.filter((d) => d.key === key);
    return lines.length === 0
      ? undefined
      : lines.flatMap((d) => d.value.split(/[\s,]+/).filter((n) => n !== ''));
  };
  const [inputs, outputs] = [listed('inputs'), listed('outputs')];
  try {
    return assignPins(
      netlist,
      { ...(inputs === undefined ? {} : { inputs }), ...(outputs === undefined ? {} : { outputs }) },
      { bidirectional: true },
    );
  } catch (e) {
    if (!(e instanceof PinError)) throw e;
    const line = pins.find((d) => d.key === e.field)?.line ?? pins[0]?.line ?? 1;
    throw new SpiceImportError(fileName, line, `${e.field}: ${e.message}`);
  }
}

const KNOWN_DIRECTIVES = new Set([
  'expect',
  'inputs',
  'outputs',
  'supply',
  'ground',
  'treat-as',
  'technology',
  'name',
  'implied-bulk',
  'implied-ground',
]);

function readExpectations(
  netlist: Netlist,
  directives: readonly Directive[],
  notes: string[],
): { expectations: Record<string, string>; lines: Record<string, number> } {
  const expectations = nameRecord<string>(); // an output may be called __proto__
  const lines = nameRecord<number>();
  for (const d of directives) {
    if (!KNOWN_DIRECTIVES.has(d.key))
      notes.push(`line ${d.line}: unknown railwise directive "${d.key}" ignored`);
    if (d.key !== 'expect') continue;
    const eq = d.value.indexOf('=');
    const output = d.value.slice(0, Math.max(eq, 0)).trim();
    if (eq < 0 || output === '') {
      notes.push(`line ${d.line}: an expect line reads "expect OUTPUT = EXPRESSION"; ignored`);
      continue;
    }
    const net = netlist.outputs.find((o) => o.toLowerCase() === output.toLowerCase()) ?? output;
    const text = d.value.slice(eq + 1).trim();
    // Our export writes an expression that would not read back as it is as a JSON string.
    expectations[net] = (text.startsWith('"') ? unquoted(text) : null) ?? text;
    lines[net] = d.line;
  }
  return { expectations, lines };
}
