import { useStore } from '../state/store.ts';
import { commandById, describeKey } from './commands.ts';

/**
 * A toolbar button: its visible word is its accessible name (so speech and search find what is
 * seen); the command's full label and key are its tooltip (read as its description). A button that shows
 * only a symbol (+, −) is named by the command's label.
 */
function CommandButton({ id, text, disabled }: { id: string; text?: string; disabled?: boolean }) {
  const c = commandById(id);
  const key = c.keys[0];
  const title = key ? `${c.label} (${describeKey(key)})` : c.label;
  const shown = text ?? c.label;
  const wordless = !/\p{L}/u.test(shown);
  return (
    <button
      type="button"
      title={title}
      aria-label={wordless ? c.label : undefined}
      data-command={id}
      disabled={disabled}
      onClick={c.run}
    >
      {shown}
    </button>
  );
}

const EXPORTS = ['export-spice', 'export-verilog', 'export-csv', 'export-svg', 'export-png'];

function ExportMenu() {
  return (
    <label className="rw-export">
      <span className="rw-visually-hidden">Export</span>
      <select
        aria-label="Export"
        value=""
        onChange={(e) => {
          const id = e.target.value;
          e.target.value = '';
          if (id) commandById(id).run();
        }}
      >
        <option value="">Export…</option>
        {EXPORTS.map((id) => (
          <option key={id} value={id}>
            {commandById(id).label.replace('Export ', '')}
          </option>
        ))}
      </select>
    </label>
  );
}

/** File, history and arrangement commands; every button names its key in its tooltip. */
export function Toolbar() {
  const canUndo = useStore((s) => s.history.past.length > 0);
  const canRedo = useStore((s) => s.history.future.length > 0);
  const hasSelection = useStore(
    (s) => s.selection.selected.parts.length + s.selection.selected.wires.length > 0,
  );
  const name = useStore((s) => s.doc.name);
  return (
    <header className="rw-toolbar" role="toolbar" aria-label="Sheet commands">
      <span className="rw-brand">Railwise</span>
      <span className="rw-cell-name" title="Cell name (edit it in the side form)">
        {name}
      </span>
      <div className="rw-group">
        <CommandButton id="new" text="New" />
        <CommandButton id="open" text="Open…" />
        <CommandButton id="save" text="Save" />
        <CommandButton id="cells" text="Cells" />
        <CommandButton id="share-link" text="Share link" />
        <ExportMenu />
      </div>
      <div className="rw-group">
        <CommandButton id="undo" text="Undo" disabled={!canUndo} />
        <CommandButton id="redo" text="Redo" disabled={!canRedo} />
      </div>
      <div className="rw-group">
        <CommandButton id="wire" text="Wire" />
        <CommandButton id="rotate" text="Turn" disabled={!hasSelection} />
        <CommandButton id="mirror" text="Flip" disabled={!hasSelection} />
        <CommandButton id="duplicate" text="Duplicate" disabled={!hasSelection} />
        <CommandButton id="delete" text="Delete" disabled={!hasSelection} />
      </div>
      <div className="rw-group">
        <CommandButton id="fit" text="View all" />
        <CommandButton id="zoom-in" text="+" />
        <CommandButton id="zoom-out" text="−" />
      </div>
      <div className="rw-group rw-right">
        <CommandButton id="help" text="Keys" />
        <CommandButton id="about" text="About" />
      </div>
    </header>
  );
}
