/**
 * The electrical model: plain readonly records, nets named by strings.
 * Lengths (W, L) are in micrometres, resistance in ohms, capacitance in farads, voltage in volts.
 */

export type MosKind = 'nmos' | 'pmos';

export interface MosDevice {
  readonly kind: MosKind;
  readonly name: string;
  readonly gate: string;
  readonly drain: string;
  readonly source: string;
  /** Bulk (body) net; when absent the rule checks assume the conventional rail. */
  readonly bulk?: string;
  /** Channel width, µm. */
  readonly w: number;
  /** Channel length, µm. */
  readonly l: number;
  /**
   * The model card whose level-1 values this device takes (`Technology.models`); absent: the
   * technology's own values for its type.
   */
  readonly model?: string;
}

export interface ResistorDevice {
  readonly kind: 'resistor';
  readonly name: string;
  readonly a: string;
  readonly b: string;
  readonly ohms: number;
}

export interface CapacitorDevice {
  readonly kind: 'capacitor';
  readonly name: string;
  readonly a: string;
  readonly b: string;
  readonly farads: number;
}

/** A protection diode: kept in the netlist, never conducts in steady state. */
export interface DiodeDevice {
  readonly kind: 'diode';
  readonly name: string;
  readonly anode: string;
  readonly cathode: string;
}

export type Device = MosDevice | ResistorDevice | CapacitorDevice | DiodeDevice;
export type DeviceKind = Device['kind'];

/**
 * A rail is a net held at a fixed voltage. A supply without `volts` sits at the technology's VDD;
 * a ground is always 0 V.
 */
export interface Rail {
  readonly net: string;
  readonly role: 'supply' | 'ground';
  readonly volts?: number;
}

export interface Netlist {
  readonly name: string;
  readonly devices: readonly Device[];
  readonly rails: readonly Rail[];
  /** Nets driven by input pins, in the order the truth table lists them. */
  readonly inputs: readonly string[];
  /** Nets observed as outputs. */
  readonly outputs: readonly string[];
}

/** Channel terminals of a device: the two nets its channel (or body) joins, if any. */
export function channelNets(device: Device): readonly [string, string] | null {
  switch (device.kind) {
    case 'nmos':
    case 'pmos':
      return [device.drain, device.source];
    case 'resistor':
      return [device.a, device.b];
    case 'capacitor':
    case 'diode':
      return null;
  }
}

/** Every net a device touches, with the terminal name. */
export function deviceTerminals(
  device: Device,
): readonly { readonly terminal: string; readonly net: string }[] {
  switch (device.kind) {
    case 'nmos':
    case 'pmos': {
      const t = [
        { terminal: 'gate', net: device.gate },
        { terminal: 'drain', net: device.drain },
        { terminal: 'source', net: device.source },
      ];
      return device.bulk === undefined ? t : [...t, { terminal: 'bulk', net: device.bulk }];
    }
    case 'resistor':
    case 'capacitor':
      return [
        { terminal: 'a', net: device.a },
        { terminal: 'b', net: device.b },
      ];
    case 'diode':
      return [
        { terminal: 'anode', net: device.anode },
        { terminal: 'cathode', net: device.cathode },
      ];
  }
}

/** The device with every terminal's net passed through `rename`. */
export function mapDeviceNets(d: Device, rename: (net: string) => string): Device {
  switch (d.kind) {
    case 'nmos':
    case 'pmos': {
      const base = { ...d, gate: rename(d.gate), drain: rename(d.drain), source: rename(d.source) };
      return d.bulk === undefined ? base : { ...base, bulk: rename(d.bulk) };
    }
    case 'resistor':
    case 'capacitor':
      return { ...d, a: rename(d.a), b: rename(d.b) };
    case 'diode':
      return { ...d, anode: rename(d.anode), cathode: rename(d.cathode) };
  }
}

/** All net names in first-appearance order: rails, inputs, outputs, then device terminals. */
export function netNames(netlist: Netlist): string[] {
  // Runs on every edit of big sheets: no per-terminal objects, one Set.
  const seen = new Set<string>();
  for (const r of netlist.rails) seen.add(r.net);
  for (const n of netlist.inputs) seen.add(n);
  for (const n of netlist.outputs) seen.add(n);
  for (const d of netlist.devices) {
    switch (d.kind) {
      case 'nmos':
      case 'pmos':
        seen.add(d.gate).add(d.drain).add(d.source);
        if (d.bulk !== undefined) seen.add(d.bulk);
        break;
      case 'resistor':
      case 'capacitor':
        seen.add(d.a).add(d.b);
        break;
      case 'diode':
        seen.add(d.anode).add(d.cathode);
        break;
    }
  }
  return [...seen];
}
