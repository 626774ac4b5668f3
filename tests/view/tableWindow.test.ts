// Behaviour of our own table, not published values: no source applies.
import { describe, expect, it } from 'vitest';
import { ROW_HEIGHT_PX, TABLE_HEIGHT_PX, visibleRows } from '../../src/core/view/tableWindow.ts';

describe('rows in the page', () => {
  const inView = Math.ceil(TABLE_HEIGHT_PX / ROW_HEIGHT_PX) + 1;

  it('are the first screenful and a margin at the top', () => {
    expect(visibleRows(65_536, 0)).toEqual({ start: 0, end: inView + 12 });
  });

  it('follow the scroll offset, with a margin either side', () => {
    const w = visibleRows(65_536, 1000 * ROW_HEIGHT_PX);
    expect(w).toEqual({ start: 1000 - 12, end: 1000 + inView + 12 });
  });

  it('end at the last row, however far the offset says', () => {
    const w = visibleRows(100, 1e9);
    expect(w.end).toBe(100);
    expect(w.end - w.start).toBeGreaterThanOrEqual(inView);
  });

  it('are all the rows of a short table, and none of an empty one', () => {
    expect(visibleRows(5, 0)).toEqual({ start: 0, end: 5 });
    expect(visibleRows(0, 300)).toEqual({ start: 0, end: 0 });
  });
});
