import { dismissNotes, useStore } from '../state/store.ts';
import { countOf } from '../core/view/plural.ts';

/**
 * The notes kept with the design (docs/semantics.md §6): after an import, what the importer
 * ignored, folded or mapped. They stay under the sheet, saved with the design, until dismissed;
 * dismissing them is one undo step.
 */
export function DesignNotes() {
  const notes = useStore((s) => s.doc.notes);
  if (notes === undefined || notes.trim() === '') return null;
  const [heading, ...lines] = notes.split('\n');
  return (
    <details className="rw-message rw-notes" data-testid="design-notes" open>
      <summary>
        {heading} {lines.length > 0 ? `(${countOf(lines.length, 'note')})` : ''}
        <button type="button" onClick={dismissNotes}>
          Dismiss notes
        </button>
      </summary>
      <ul>
        {lines.map((line, i) => (
          <li key={i}>{line}</li>
        ))}
      </ul>
    </details>
  );
}
