import { useState, type KeyboardEvent } from 'react';
import { SHELF_KINDS, partSpec, type PartKind } from '../core/sheet/parts/index.ts';
import { findPartKinds } from '../core/sheet/parts/search.ts';
import { startPlacing } from '../editor/actions.ts';
import { useStore } from '../state/store.ts';
import { PART_SEARCH_ID, placeKeyOf } from './commands.ts';

function hintFor(kind: PartKind): string {
  const key = placeKeyOf(kind);
  const how = key === null ? 'press /, type its name and Enter' : `press ${key}`;
  return `${partSpec(kind).title}: ${how}, then click the sheet (Shift-click to keep placing)`;
}

/**
 * Enter places the highlighted match (nothing while the box is empty), arrows move the highlight,
 * and Enter or Escape clears the box and gives the keys back to the sheet.
 */
function useSearchKeys(query: string, matches: readonly PartKind[], clear: () => void) {
  const [chosen, setChosen] = useState(0);
  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>): void => {
    const step = e.key === 'ArrowDown' ? 1 : e.key === 'ArrowUp' ? -1 : 0;
    if (step !== 0 && matches.length > 0) {
      e.preventDefault();
      setChosen((i) => (i + step + matches.length) % matches.length);
    }
    if (e.key !== 'Enter' && e.key !== 'Escape') return;
    const kind = query.trim() === '' ? undefined : matches[Math.min(chosen, matches.length - 1)];
    if (e.key === 'Enter' && kind !== undefined) startPlacing(kind);
    clear();
    setChosen(0);
    e.currentTarget.blur();
  };
  return { chosen: Math.min(chosen, matches.length - 1), onKeyDown, reset: () => setChosen(0) };
}

/**
 * One button per part kind in shelf order, and a search box above them: press / (or click the
 * box), type part of a name, Enter, then click the sheet. The first nine kinds also have a number
 * key; the search reaches every kind, however many there are.
 */
export function PartsShelf() {
  const tool = useStore((s) => s.tool);
  const [query, setQuery] = useState('');
  const matches = query.trim() === '' ? SHELF_KINDS : findPartKinds(query);
  const search = useSearchKeys(query, matches, () => setQuery(''));
  return (
    <section className="rw-shelf" aria-label="Parts">
      <h2>Parts</h2>
      <input
        className="rw-part-search"
        type="search"
        id={PART_SEARCH_ID}
        aria-label="Find a part"
        placeholder="Find a part  /"
        value={query}
        onChange={(e) => {
          setQuery(e.target.value);
          search.reset();
        }}
        onKeyDown={search.onKeyDown}
      />
      <div className="rw-parts">
        {matches.map((kind, i) => {
          const active = tool.mode === 'place' && tool.kind === kind;
          const key = placeKeyOf(kind);
          const chosen = query.trim() !== '' && i === search.chosen;
          return (
            <button
              key={kind}
              type="button"
              className={[active ? 'active' : '', chosen ? 'chosen' : ''].join(' ').trim() || undefined}
              aria-pressed={active}
              data-part={kind}
              title={hintFor(kind)}
              onClick={() => startPlacing(kind)}
            >
              {key === null ? null : <kbd>{key}</kbd>} {partSpec(kind).title}
            </button>
          );
        })}
        {matches.length === 0 ? <p className="rw-hint">No part is called that.</p> : null}
      </div>
      <p className="rw-hint">
        Drag from any pin to wire it. Click a wire's end on a pin or another wire to finish.
      </p>
    </section>
  );
}
