import { useState } from 'react';
import type { InputVector } from '../core/model/design.ts';
import {
  SEQUENCE_FORMAT_HINT,
  SequenceTextError,
  formatSequenceText,
  heldSteps,
  parseSequenceText,
} from '../core/analysis/sequenceText.ts';
import { insertStep, moveStep, nextCellValue, removeStep, setStepCell } from '../core/view/sequenceEdit.ts';

interface StepEditorProps {
  readonly inputs: readonly string[];
  readonly steps: readonly InputVector[];
  readonly selectedStep: number | null;
  readonly onChange: (steps: InputVector[]) => void;
  readonly onPickStep: (step: number) => void;
}

interface StepRowProps {
  readonly index: number;
  readonly step: InputVector;
  /** The values in force at this step, held ones included. */
  readonly held: InputVector;
  readonly props: StepEditorProps;
}

function StepRow({ index, step, held, props }: StepRowProps) {
  const { inputs, steps, onChange, selectedStep, onPickStep } = props;
  return (
    <tr className={index === selectedStep ? 'rw-selected' : undefined} data-testid={`step-${index}`}>
      <td>
        <button
          type="button"
          className="rw-link"
          onClick={() => onPickStep(index)}
          title="Show this step on the sheet"
        >
          {index + 1}
        </button>
      </td>
      {inputs.map((name) => (
        <td key={name}>
          <button
            type="button"
            className={`rw-bit rw-bit-${held[name] ?? 'X'}${step[name] === undefined ? ' rw-held' : ''}`}
            data-testid={`step-${index}-${name}`}
            title={`${step[name] === undefined ? 'held from the step before' : 'set here'}; click to cycle held → 0 → 1 → Z → X`}
            onClick={() => onChange(setStepCell(steps, index, name, nextCellValue(step[name])))}
          >
            {held[name] ?? 'X'}
          </button>
        </td>
      ))}
      <td className="rw-step-tools">
        <button
          type="button"
          aria-label={`move step ${index + 1} up`}
          onClick={() => onChange(moveStep(steps, index, -1))}
        >
          ↑
        </button>
        <button
          type="button"
          aria-label={`move step ${index + 1} down`}
          onClick={() => onChange(moveStep(steps, index, 1))}
        >
          ↓
        </button>
        <button
          type="button"
          aria-label={`remove step ${index + 1}`}
          onClick={() => onChange(removeStep(steps, index))}
        >
          ✕
        </button>
      </td>
    </tr>
  );
}

function StepText({ inputs, steps, onChange }: Pick<StepEditorProps, 'inputs' | 'steps' | 'onChange'>) {
  const [text, setText] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const shown = text ?? formatSequenceText(steps, inputs);
  const apply = (): void => {
    try {
      onChange(parseSequenceText(shown, inputs));
      setText(null);
      setError(null);
    } catch (e) {
      if (!(e instanceof SequenceTextError)) throw e;
      setError(e.message);
    }
  };
  return (
    <div className="rw-step-text">
      <p id="rw-steps-format" className="rw-muted" data-testid="steps-format">
        {SEQUENCE_FORMAT_HINT}
      </p>
      <textarea
        aria-label="Steps as text"
        aria-describedby="rw-steps-format"
        data-testid="steps-text"
        spellCheck={false}
        rows={Math.min(8, Math.max(2, steps.length + 1))}
        value={shown}
        aria-invalid={error !== null}
        onChange={(e) => setText(e.target.value)}
      />
      <button type="button" onClick={apply} data-testid="steps-apply">
        Apply text
      </button>
      {error !== null && (
        <span className="rw-parse-error" role="alert">
          ✗ {error}
        </span>
      )}
    </div>
  );
}

/**
 * A list of steps as a grid of input values. A step sets only what it changes; faded cells show the
 * value held from the step before. Steps can also be typed as text (see SEQUENCE_FORMAT_HINT).
 */
export function StepEditor(props: StepEditorProps) {
  const { inputs, steps, onChange } = props;
  const held = heldSteps(inputs, steps);
  return (
    <div>
      <table className="rw-steps">
        <thead>
          <tr>
            <th>step</th>
            {inputs.map((n) => (
              <th key={n} className="rw-mono">
                {n}
              </th>
            ))}
            <th />
          </tr>
        </thead>
        <tbody>
          {steps.map((step, i) => (
            <StepRow key={i} index={i} step={step} held={held[i] ?? {}} props={props} />
          ))}
        </tbody>
      </table>
      <button
        type="button"
        data-testid="step-add"
        onClick={() => onChange(insertStep(steps, steps.length, {}))}
      >
        + Add step
      </button>
      <StepText key={formatSequenceText(steps, inputs)} inputs={inputs} steps={steps} onChange={onChange} />
    </div>
  );
}
