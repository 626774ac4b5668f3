/**
 * The JSON shape of a sizing report (`railwise check --sizing` and the power-and-sizing panel).
 * Units: ohms, farads, seconds, µm. Keep these names stable; add fields freely.
 */

/** A control net's value in the configuration that sets a worst case. */
export type ControlValue = '0' | '1';

/**
 * The worst case of one network (pull-up or pull-down) of an output: the highest effective
 * resistance over every assignment of its gate signals that connects the output to a source.
 */
export interface NetworkDrive {
  /** Effective resistance between the output and the sources of this network, ohms. */
  readonly ohms: number;
  /** The most resistive conducting chain in that configuration: source first, output last. */
  readonly path: readonly string[];
  /** The gate-signal assignment that gives the worst case. */
  readonly controls: Readonly<Record<string, ControlValue>>;
}

/** An Elmore delay estimate of the worst-case transition with its path and configuration. */
export interface DelayEstimate {
  /** Elmore time constant (first moment of the impulse response), seconds. */
  readonly seconds: number;
  readonly path: readonly string[];
  readonly controls: Readonly<Record<string, ControlValue>>;
}

/** The inverter whose NMOS matches the worst pull-down and whose PMOS matches the worst pull-up. */
export interface EquivalentInverter {
  /** NMOS width, µm. */
  readonly wn: number;
  /** PMOS width, µm. */
  readonly wp: number;
  /** Channel length both are drawn at, µm (the shortest length in the cell). */
  readonly l: number;
  /** Its input capacitance, farads: the Cinv of g = Cin / Cinv. */
  readonly cin: number;
  /** Its output diffusion capacitance, farads: the reference of the parasitic delay. */
  readonly cdiff: number;
}

export interface OutputSizing {
  readonly output: string;
  readonly pullUp: NetworkDrive | null;
  readonly pullDown: NetworkDrive | null;
  readonly equivalentInverter: EquivalentInverter | null;
  /** Gate capacitance each input presents, farads (every gate it drives in the cell). */
  readonly inputCapacitance: Readonly<Record<string, number>>;
  /** g = Cin / Cinv per input; null for an input that drives no gate (a pass input). */
  readonly logicalEffort: Readonly<Record<string, number | null>>;
  /**
   * Effort of the rising and of the falling transition against the technology's own inverter
   * (null where an input drives no gate or the network cannot overcome a ratioed load).
   */
  readonly logicalEffortRise: Readonly<Record<string, number | null>>;
  readonly logicalEffortFall: Readonly<Record<string, number | null>>;
  /** Output diffusion capacitance over the equivalent inverter's, in units of p_inv. */
  readonly parasiticDelay: number | null;
  /** Capacitance on the output (diffusion, gates, capacitors and the load), farads. */
  readonly outputCapacitance: number;
  readonly rise: DelayEstimate | null;
  readonly fall: DelayEstimate | null;
  readonly notes: readonly string[];
}

export interface SizingReport {
  /** One sentence naming the models: worst case, unit RC, Elmore. */
  readonly convention: string;
  /** Load added to every output, farads. */
  readonly load: number;
  readonly outputs: readonly OutputSizing[];
  /** The figures of the first output, for quick reading and the command line. */
  readonly logicalEffort: Readonly<Record<string, number | null>>;
  readonly parasiticDelay: number | null;
  readonly rise: DelayEstimate | null;
  readonly fall: DelayEstimate | null;
  readonly notes: readonly string[];
}

export interface SizingOptions {
  /** Load capacitance on each output, farads (default 0). */
  readonly load?: number;
  /**
   * Count the node between two series transistors as one shared diffusion region (the usual layout,
   * and the assumption of Weste & Harris' unit RC model) rather than one region per terminal.
   * Default true.
   */
  readonly sharedDiffusion?: boolean;
}
