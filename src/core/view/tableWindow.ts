/**
 * Which rows of a long table are in the page: those in view at the current scroll position and a
 * few either side. Rows have a fixed height (set in panels.css), so the window follows from the
 * scroll offset alone, without measuring anything.
 */

/** Height of one table row, pixels: `.rw-vectors tbody tr` in src/panels/panels.css. */
export const ROW_HEIGHT_PX = 21;
/** The table's scrolling area, pixels. */
export const TABLE_HEIGHT_PX = 320;
/** Rows kept in the page above and below the view, so a short scroll shows no gap. */
const OVERSCAN_ROWS = 12;

export interface RowWindow {
  readonly start: number;
  readonly end: number;
}

export function visibleRows(count: number, scrollTop: number, viewHeight = TABLE_HEIGHT_PX): RowWindow {
  const first = Math.floor(Math.max(0, scrollTop) / ROW_HEIGHT_PX);
  const inView = Math.ceil(viewHeight / ROW_HEIGHT_PX) + 1;
  const start = Math.max(0, Math.min(first - OVERSCAN_ROWS, count - inView - OVERSCAN_ROWS));
  const end = Math.min(count, first + inView + OVERSCAN_ROWS);
  return { start: Math.max(0, start), end: Math.max(Math.max(0, start), end) };
}
