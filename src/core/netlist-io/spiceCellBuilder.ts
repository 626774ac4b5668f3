/**
 * What the body reader (`spiceBodies.ts`) builds a cell with, and what it shares with the readers it
 * calls: the device readers (`spiceDevices.ts`) and the short links (`spiceShorts.ts`). Kept apart so
 * those readers use the builder without importing the body reader that calls them.
 */
import type { Device, MosKind } from '../model/netlist.ts';
import type { Instance } from '../model/design.ts';
import type { DeviceModel } from '../model/technology.ts';
import type { StandIn } from './deviceNames.ts';
import { SpiceImportError } from './spiceErrors.ts';
import type { SpiceFile } from './spiceParse.ts';
import type { Scale } from './spiceScale.ts';

export interface ShortLink {
  readonly name: string;
  readonly line: number;
  readonly a: string;
  readonly b: string;
}

export interface DeviceNotes {
  readonly ignoredParams: Set<string>;
  readonly folded: string[];
  readonly sized: string[];
  readonly standIns: Map<string, { kind: StandIn; count: number; byRule: boolean }>;
  /** About model cards: other levels, bins, fields left to the technology. */
  readonly models: Set<string>;
}

/** What a device line's model gives it: its type, and the card whose level-1 values it takes. */
export interface ModelUse {
  readonly kind: MosKind;
  readonly model?: string;
}

/** A `V` line with its nets resolved in its body. */
export interface FlatSource {
  readonly name: string;
  readonly line: number;
  readonly plus: string;
  readonly minus: string;
  readonly volts: number;
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
