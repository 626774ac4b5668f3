import { COMMANDS, describeKey, type Command } from './commands.ts';
import { setOverlay } from '../state/store.ts';
import { Dialog } from './Dialog.tsx';

const GROUPS: Command['group'][] = ['Parts', 'Edit', 'View', 'Analysis', 'File', 'Help'];

const MOUSE: readonly [string, string][] = [
  ['Click', 'select a part or wire'],
  ['Shift-click', 'add to or remove from the selection'],
  ['Drag a selected part', 'move it; wires follow'],
  ['Drag on empty sheet', 'select everything inside the box'],
  ['Drag from a pin', 'draw a wire; release on a pin, or click to bend, then click a pin or wire'],
  ['Double-click', 'end a wire where it is; on a part, edit its name'],
  ['Wheel', 'zoom around the pointer'],
  ['Right or middle drag', 'pan the sheet'],
  ['Esc', 'cancel the wire, drag or placement in progress; else clear the selection'],
];

/** How connections are made and kept (docs/semantics.md §1, "No silent connections"). */
export const CONNECTION_RULE: readonly string[] = [
  'Only a wire, a net name (rail, pin or label), or a pin dropped on a pin or a wire end connects.',
  'Turn, Flip, arrow nudges and drags keep every connection (wires follow; pins that touched get a short wire) and make no new one: one that would join or cut nets is not done, the nets are named and the place is marked on the sheet.',
  'Duplicate and paste land where they touch nothing; copied pins, rails and labels still join their nets by name.',
  'A contact made on purpose is marked on the sheet until the next change, and is one undo away.',
];

/** The key map, read from the command registry so it can never disagree with the keys. */
export function HelpOverlay() {
  return (
    <Dialog title="Keys and mouse" onClose={() => setOverlay(null)}>
      <div className="rw-help">
        {GROUPS.map((g) => (
          <section key={g}>
            <h3>{g}</h3>
            <dl>
              {COMMANDS.filter((c) => c.group === g && c.keys.length > 0).map((c) => (
                <div key={c.id}>
                  <dt>{c.keys.map(describeKey).join(' or ')}</dt>
                  <dd>{c.label}</dd>
                </div>
              ))}
            </dl>
          </section>
        ))}
        <section data-testid="connection-rule">
          <h3>Connections</h3>
          <ul>
            {CONNECTION_RULE.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
        </section>
        <section>
          <h3>Mouse</h3>
          <dl>
            {MOUSE.map(([k, v]) => (
              <div key={k}>
                <dt>{k}</dt>
                <dd>{v}</dd>
              </div>
            ))}
          </dl>
        </section>
      </div>
    </Dialog>
  );
}
