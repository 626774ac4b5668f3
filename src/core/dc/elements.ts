import type { CompiledNetlist } from '../compile/compile.ts';
import type { Level1Device } from './level1.ts';

/**
 * What the nodal equations (`assemble.ts`) read of a DC network: the compiled netlist and each
 * channel element's DC parameters. `DcNetwork` (`network.ts`) is the one implementation; the
 * equations see only this, so the network can build and keep its systems without an import cycle.
 */
export interface DcElements {
  readonly compiled: CompiledNetlist;
  /** Level-1 parameters per channel element, null for resistors. */
  readonly devices: readonly (Level1Device | null)[];
  /** Siemens per channel element (resistors only). */
  readonly conductance: Float64Array;
  /** Bulk net per channel element, -1 where the device names none (or for resistors). */
  readonly bulk: Int32Array;
  /** Bulk volts where the device names no bulk: ground for NMOS, VDD for PMOS. */
  readonly bulkDefault: Float64Array;
}
