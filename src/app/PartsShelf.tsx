import { PART_KINDS, partSpec } from '../core/sheet/parts/index.ts';
import { startPlacing } from '../editor/actions.ts';
import { useStore } from '../state/store.ts';

/** One button per part kind, in key order: press the number or click, then click the sheet. */
export function PartsShelf() {
  const tool = useStore((s) => s.tool);
  return (
    <section className="rw-shelf" aria-label="Parts">
      <h2>Parts</h2>
      <div className="rw-parts">
        {PART_KINDS.map((kind, i) => {
          const active = tool.mode === 'place' && tool.kind === kind;
          return (
            <button
              key={kind}
              type="button"
              className={active ? 'active' : undefined}
              aria-pressed={active}
              data-part={kind}
              title={`${partSpec(kind).title}: press ${i + 1}, then click the sheet (Shift-click to keep placing)`}
              onClick={() => startPlacing(kind)}
            >
              <kbd>{i + 1}</kbd> {partSpec(kind).title}
            </button>
          );
        })}
      </div>
      <p className="rw-hint">
        Drag from any pin to wire it. Click a wire's end on a pin or another wire to finish.
      </p>
    </section>
  );
}
