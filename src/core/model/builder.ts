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
}

/**
 * A small fluent builder for tests and examples:
 * `circuit('inv').supply('VDD').ground('GND').input('A').output('Y')
 *    .pmos('P1', { g: 'A', d: 'Y', s: 'VDD' }).nmos('N1', { g: 'A', d: 'Y', s: 'GND' }).build()`.
 * Each call returns a new builder; nothing is mutated.
 */
export class CircuitBuilder {
  private constructor(private readonly netlist: Netlist) {}

  static empty(name: string): CircuitBuilder {
    return new CircuitBuilder({ name, devices: [], rails: [], inputs: [], outputs: [] });
  }

  private with(patch: Partial<Netlist>): CircuitBuilder {
    return new CircuitBuilder({ ...this.netlist, ...patch });
  }

  private add(device: Device): CircuitBuilder {
    return this.with({ devices: [...this.netlist.devices, device] });
  }

  private rail(rail: Rail): CircuitBuilder {
    return this.with({ rails: [...this.netlist.rails, rail] });
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
    return this.with({ inputs: [...this.netlist.inputs, ...nets] });
  }

  output(...nets: string[]): CircuitBuilder {
    return this.with({ outputs: [...this.netlist.outputs, ...nets] });
  }

  nmos(name: string, t: MosTerminals): CircuitBuilder {
    return this.mos('nmos', name, t);
  }

  pmos(name: string, t: MosTerminals): CircuitBuilder {
    return this.mos('pmos', name, t);
  }

  private mos(kind: 'nmos' | 'pmos', name: string, t: MosTerminals): CircuitBuilder {
    const base = { kind, name, gate: t.g, drain: t.d, source: t.s, w: t.w ?? 1, l: t.l ?? 0.25 };
    return this.add(t.b === undefined ? base : { ...base, bulk: t.b });
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
    return this.netlist;
  }
}

export function circuit(name = 'cell'): CircuitBuilder {
  return CircuitBuilder.empty(name);
}
