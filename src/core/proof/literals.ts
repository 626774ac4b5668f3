/**
 * What the encoding of a cell knows about nets and groups, as literals of one `Cnf`. All of them are
 * functions of the input pins: for each 0/1 input vector exactly one model extends it.
 */

/** A net exactly at VDD (`high`) or exactly at 0 V (`low`); neither: another voltage, X or Z. */
export interface RailLits {
  readonly high: number;
  readonly low: number;
}

/** What the properties read of an output: its level (X when none holds) and the degraded flag. */
export interface LevelLits {
  readonly l0: number;
  readonly l1: number;
  readonly lz: number;
  readonly degraded: number;
}

/** A group's contribution to the cell-wide properties and to the encoding's blind spots. */
export interface GroupLits {
  /**
   * True for the vectors the encoding does not describe the engine for: a control at a voltage
   * other than 0 or VDD, or (structural groups) sources of both levels meeting in a ratioed fight.
   */
  readonly unknown: number;
  /** Some element of the group carries current. */
  readonly current: number;
  /** Some net of the group is flagged for contention. */
  readonly contention: number;
  /** Why the group cannot be reasoned about at all (a loop past the bounds, …), or null. */
  readonly blocker: string | null;
  /** True for the vectors where the group holds stored state (several steady states; FALSE for most). */
  readonly storedState: number;
  /** The nets that hold it, for the reason. */
  readonly storedNets: readonly string[];
}

/** One group's encoding: its group literals and the literals of the nets later groups or outputs read. */
export interface GroupEncoding extends GroupLits {
  readonly rails: ReadonlyMap<number, RailLits>;
  readonly levels: ReadonlyMap<number, LevelLits>;
}

/** What a group encoder is told about the cell around it. */
export interface GroupContext {
  /** The rail literals of a control (an input pin, a rail, or a net of an earlier group). */
  rail(net: number): RailLits;
  /** Whether a net of the group needs rail literals (it feeds a gate) or level literals (an output). */
  needsRail(net: number): boolean;
  needsLevel(net: number): boolean;
  /** Name of a net, for reasons. */
  name(net: number): string;
}
