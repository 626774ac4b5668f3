import type { Point } from '../../core/sheet/types.ts';

/** A pointer event as tools see it: the sheet point (grid units, not snapped) and modifiers. */
export interface ToolPointer {
  readonly at: Point;
  /** Screen pixels, for panning. */
  readonly screen: Point;
  readonly shift: boolean;
  /** 0 primary, 1 middle, 2 secondary. */
  readonly button: number;
}

/**
 * A tool is a small state machine fed pointer events. `cancel` answers whether it had something
 * to cancel, so Escape can fall through to "clear the selection" when it did not.
 */
export interface ToolMachine {
  readonly name: string;
  state(): string;
  down(e: ToolPointer): void;
  move(e: ToolPointer): void;
  up(e: ToolPointer): void;
  cancel(): boolean;
}
