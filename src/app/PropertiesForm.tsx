import { useState } from 'react';
import type { SheetPart } from '../core/sheet/types.ts';
import { partSpec } from '../core/sheet/parts/index.ts';
import { editPart } from '../editor/actions.ts';
import { setDesignFields, store, useStore } from '../state/store.ts';
import { fieldPatch, fieldsFor, fieldText, fieldValue, readField, type FormField } from './fieldRules.ts';

/** One field: applied on Enter or when focus leaves; a bad value stays in the box with its reason. */
function Field({ part, field }: { part: SheetPart; field: FormField }) {
  const [text, setText] = useState(fieldText(part, field.key));
  const [error, setError] = useState<string | null>(null);
  const apply = (): void => {
    const r = readField(field.key, text, part, store.getState().doc.sheet);
    if (!r.ok) return setError(r.error);
    setError(null);
    if (r.value !== fieldValue(part, field.key)) editPart(part.id, fieldPatch(field.key, r.value));
  };
  const id = `field-${field.key}`;
  return (
    <div className="rw-field">
      <label htmlFor={id}>{field.label}</label>
      <input
        id={id}
        data-field={field.key}
        value={text}
        aria-invalid={error !== null}
        onChange={(e) => setText(e.target.value)}
        onBlur={apply}
        onKeyDown={(e) => {
          if (e.key === 'Enter') apply();
          if (e.key === 'Escape') {
            setText(fieldText(part, field.key));
            setError(null);
          }
        }}
      />
      {error ? (
        <span className="rw-field-error" role="alert">
          {error}
        </span>
      ) : null}
    </div>
  );
}

function CellNameField() {
  const name = useStore((s) => s.doc.name);
  const [text, setText] = useState(name);
  const apply = () => {
    const v = text.trim();
    if (v !== '' && v !== name) setDesignFields({ name: v });
    else setText(name);
  };
  return (
    <div className="rw-field">
      <label htmlFor="field-cell">Cell name</label>
      <input
        id="field-cell"
        value={text}
        onChange={(e) => setText(e.target.value)}
        onBlur={apply}
        onKeyDown={(e) => e.key === 'Enter' && apply()}
      />
    </div>
  );
}

/** The kind and, when it has one, the size as the sheet labels it: "Resistor · 10 kΩ". */
function kindLine(part: SheetPart): string {
  const spec = partSpec(part.kind);
  const value = spec.valueLabel(part);
  return value === '' ? spec.title : `${spec.title} · ${value}`;
}

/** The side form: the selected part's properties, or the cell's name when nothing single is selected. */
export function PropertiesForm() {
  const selected = useStore((s) => s.selection.selected);
  const part = useStore((s) =>
    selected.parts.length === 1 ? s.doc.sheet.parts.find((p) => p.id === selected.parts[0]) : undefined,
  );
  const docName = useStore((s) => s.doc.name);
  const count = selected.parts.length + selected.wires.length;
  return (
    <section className="rw-shelf rw-properties" aria-label="Properties">
      <h2>Properties</h2>
      {part ? (
        <form key={`${part.id}:${JSON.stringify(part)}`} onSubmit={(e) => e.preventDefault()}>
          <p className="rw-kind">{kindLine(part)}</p>
          {fieldsFor(part).map((f) => (
            <Field key={f.key} part={part} field={f} />
          ))}
          {'model' in part && part.model !== undefined && (
            <p className="rw-hint" data-testid="part-model">
              Model card {part.model}: its level-1 values set this transistor's DC model.
            </p>
          )}
          {part.kind === 'instance' && (
            <p className="rw-hint" data-testid="part-instance">
              Places cell {part.cell}: its inputs on the left, its outputs on the right. Double-click it to
              descend.
            </p>
          )}
        </form>
      ) : (
        <>
          <CellNameField key={docName} />
          <p className="rw-hint">
            {count > 1 ? `${count} items selected.` : 'Select one part to edit its name and size.'}
          </p>
        </>
      )}
    </section>
  );
}
