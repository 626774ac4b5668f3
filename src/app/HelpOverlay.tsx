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
