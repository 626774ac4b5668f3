import { Dialog } from './Dialog.tsx';
import { countOf } from '../core/view/plural.ts';
import { closeCellChoice, useStore } from '../state/store.ts';
import { loadImportedCellLater } from './fileCommands.ts';

/** Picks one cell of an imported library; closing it leaves the open design as it was. */
export function CellChooser() {
  const choice = useStore((s) => s.cellChoice);
  if (!choice) return null;
  return (
    <Dialog title={`Cells in ${choice.fileName}`} onClose={closeCellChoice}>
      <p>This file is a library. Pick the cell to open:</p>
      <ul className="rw-starters">
        {choice.designs.map((d) => (
          <li key={d.name}>
            <button
              type="button"
              onClick={() => {
                closeCellChoice();
                void loadImportedCellLater(d, choice.fileName, choice.failed);
              }}
            >
              {d.name} — {countOf(d.netlist.devices.length, 'device')}, inputs{' '}
              {d.netlist.inputs.join(' ') || 'none'}
            </button>
          </li>
        ))}
      </ul>
      {choice.failed.length > 0 ? (
        <p className="rw-field-error">Not readable: {choice.failed.join('; ')}</p>
      ) : null}
    </Dialog>
  );
}
