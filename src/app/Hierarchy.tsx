import { useStore } from '../state/store.ts';
import { ascendTo, descendInto, sheetPath } from '../state/navigation.ts';
import { addCell, placeInstance } from '../state/cells.ts';
import { fitToView } from '../state/view.ts';
import './library.css';

/**
 * The path above the sheet when it shows a cell inside another: the top cell, then each instance
 * descended into; a step goes back up to it. Hidden for a cell shown on its own.
 */
export function SheetPath() {
  useStore((s) => s.revision);
  const path = sheetPath();
  if (path.length < 2) return null;
  return (
    <nav className="rw-sheet-path" aria-label="Cell path">
      {path.map((step, level) => {
        const text = step.instance === null ? step.cell : `${step.instance} (${step.cell})`;
        const last = level === path.length - 1;
        return (
          <span key={`${level}-${text}`}>
            {level > 0 ? ' › ' : null}
            {last ? (
              <strong aria-current="page">{text}</strong>
            ) : (
              <button
                type="button"
                onClick={() => {
                  ascendTo(level);
                  fitToView();
                }}
              >
                {text}
              </button>
            )}
          </span>
        );
      })}
    </nav>
  );
}

/**
 * The instances the open cell places, each a way down into the cell it places; a cell of the design
 * placed as a new instance (wired by name until instances are drawn); a new cell in the design.
 */
export function InstanceList() {
  const instances = useStore((s) => s.openCell.instances);
  const open = useStore((s) => s.doc.name);
  const cells = useStore((s) => s.doc.cells);
  const others = (cells ?? []).filter((c) => c.name !== open);
  return (
    <section className="rw-shelf" aria-label="Instances">
      <h2>Instances</h2>
      <ul className="rw-starters">
        {instances.map((i) => (
          <li key={i.name}>
            <button
              type="button"
              title={`Descend into ${i.name} to see and edit ${i.cell} with the levels it has here`}
              onClick={() => {
                descendInto(i.name);
                fitToView();
              }}
            >
              {i.name} — {i.cell}
            </button>
          </li>
        ))}
      </ul>
      {others.length > 0 ? (
        <select
          aria-label="Place a cell as an instance"
          value=""
          onChange={(e) => {
            const cell = e.target.value;
            e.target.value = '';
            if (cell) placeInstance(cell);
          }}
        >
          <option value="">Place a cell…</option>
          {others.map((c) => (
            <option key={c.name} value={c.name}>
              {c.name}
            </option>
          ))}
        </select>
      ) : null}
      <button
        type="button"
        onClick={() => {
          addCell();
          fitToView();
        }}
      >
        New cell in this design
      </button>
    </section>
  );
}
