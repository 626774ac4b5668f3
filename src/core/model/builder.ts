import type { Device, Netlist, Rail } from './netlist.ts';

interface MosTerminals {
  readonly g: string;
  readonly d: string;
  readonly s: string;
  readonly b?: string;
  /** Width in µm (default 1). */
  readonly w?: number;
  /** Length in µm (default 0.25). */
  readonly l?: number;
  /** Model card name (`Technology.models`). */
  readonly model?: string;
}

/** One step of a builder: a persistent list, newest first, so adding is O(1) and never copies. */
type Entry =
  | { readonly kind: 'device'; readonly device: Device }
  | { readonly kind: 'rail'; readonly rail: Rail }
  | { readonly kind: 'input' | 'output'; readonly nets: readonly string[] };

interface Chain {
  readonly entry: Entry;
  readonly previous: Chain | null;
}

/**
 * A small fluent builder for tests and examples:
 * `circuit('inv').supply('VDD').ground('GND').input('A').output('Y')
 *    .pmos('P1', { g: 'A', d: 'Y', s: 'VDD' }).nmos('N1', { g: 'A', d: 'Y', s: 'GND' }).build()`.
 * Each call returns a new builder and shares the earlier steps, so a partly built circuit can be
 * extended in two ways; nothing is mutated and building n devices takes O(n).
 */
export class CircuitBuilder {
  private constructor(
    private readonly name: string,
    private readonly chain: Chain | null,
  ) {}

  static empty(name: string): CircuitBuilder {
    return new CircuitBuilder(name, null);
  }

  private push(entry: Entry): CircuitBuilder {
    return new CircuitBuilder(this.name, { entry, previous: this.chain });
  }

  private add(device: Device): CircuitBuilder {
    return this.push({ kind: 'device', device });
  }

  private rail(rail: Rail): CircuitBuilder {
    return this.push({ kind: 'rail', rail });
  }

  supply(net = 'VDD', volts?: number): CircuitBuilder {
    return this.rail(volts === undefined ? { net, role: 'supply' } : { net, role: 'supply', volts });
  }

  ground(net = 'GND'): CircuitBuilder {
    return this.rail({ net, role: 'ground' });
  }

  /** VDD and GND, the usual pair. */
  rails(): CircuitBuilder {
    return this.supply().ground();
  }

  input(...nets: string[]): CircuitBuilder {
    return this.push({ kind: 'input', nets });
  }

  output(...nets: string[]): CircuitBuilder {
    return this.push({ kind: 'output', nets });
  }

  nmos(name: string, t: MosTerminals): CircuitBuilder {
    return this.mos('nmos', name, t);
  }

  pmos(name: string, t: MosTerminals): CircuitBuilder {
    return this.mos('pmos', name, t);
  }

  private mos(kind: 'nmos' | 'pmos', name: string, t: MosTerminals): CircuitBuilder {
    const base = { kind, name, gate: t.g, drain: t.d, source: t.s, w: t.w ?? 1, l: t.l ?? 0.25 };
    const withBulk = t.b === undefined ? base : { ...base, bulk: t.b };
    return this.add(t.model === undefined ? withBulk : { ...withBulk, model: t.model });
  }

  resistor(name: string, a: string, b: string, ohms: number): CircuitBuilder {
    return this.add({ kind: 'resistor', name, a, b, ohms });
  }

  capacitor(name: string, a: string, b: string, farads: number): CircuitBuilder {
    return this.add({ kind: 'capacitor', name, a, b, farads });
  }

  diode(name: string, anode: string, cathode: string): CircuitBuilder {
    return this.add({ kind: 'diode', name, anode, cathode });
  }

  build(): Netlist {
    const entries: Entry[] = [];
    for (let c = this.chain; c !== null; c = c.previous) entries.push(c.entry);
    entries.reverse();
    const devices: Device[] = [];
    const rails: Rail[] = [];
    const inputs: string[] = [];
    const outputs: string[] = [];
    for (const e of entries) {
      if (e.kind === 'device') devices.push(e.device);
      else if (e.kind === 'rail') rails.push(e.rail);
      else (e.kind === 'input' ? inputs : outputs).push(...e.nets);
    }
    return { name: this.name, devices, rails, inputs, outputs };
  }
}

export function circuit(name = 'cell'): CircuitBuilder {
  return CircuitBuilder.empty(name);
}
