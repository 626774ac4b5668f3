import { STARTERS } from '../core/starters/index.ts';
import { loadDesign, showMessage } from '../state/store.ts';
import { fitToView } from '../state/view.ts';

/** The starter cells: each opens as an undoable step, placed automatically. */
export function StarterShelf() {
  return (
    <section className="rw-shelf" aria-label="Starter cells">
      <h2>Starter cells</h2>
      <ul className="rw-starters">
        {STARTERS.map((s) => (
          <li key={s.id}>
            <button
              type="button"
              data-starter={s.id}
              title={s.summary}
              onClick={() => {
                loadDesign(s.design);
                fitToView();
                showMessage('info', `${s.title}: ${s.summary}`);
              }}
            >
              {s.title}
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
