import { useState } from 'react';
import type { InputVector } from '../core/model/design.ts';
import { cycledValue } from '../core/view/vectorControl.ts';
import {
  StepTextError,
  formatSteps,
  insertStep,
  moveStep,
  parseSteps,
  removeStep,
  setStepValue,
} from '../core/view/sequenceEdit.ts';

interface StepEditorProps {
  readonly inputs: readonly string[];
  readonly steps: readonly InputVector[];
  readonly selectedStep: number | null;
  readonly onChange: (steps: InputVector[]) => void;
  readonly onPickStep: (step: number) => void;
}

function StepRow({ index, step, props }: { index: number; step: InputVector; props: StepEditorProps }) {
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
            className={`rw-bit rw-bit-${step[name] ?? '0'}`}
            data-testid={`step-${index}-${name}`}
            title="Click to cycle 0 → 1 → Z → X"
            onClick={() => onChange(setStepValue(steps, index, name, cycledValue(step[name])))}
          >
            {step[name] ?? '0'}
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
  const shown = text ?? formatSteps(steps, inputs);
  const apply = (): void => {
    try {
      onChange(parseSteps(shown, inputs));
      setText(null);
      setError(null);
    } catch (e) {
      if (!(e instanceof StepTextError)) throw e;
      setError(`column ${e.position + 1}: ${e.message}`);
    }
  };
  return (
    <div className="rw-step-text">
      <textarea
        data-testid="steps-text"
        spellCheck={false}
        rows={2}
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

/** A list of steps as a grid of input values; steps can also be typed as `A=0 B=1; A=1`. */
export function StepEditor(props: StepEditorProps) {
  const { inputs, steps, onChange } = props;
  const blank: InputVector = Object.fromEntries(inputs.map((n) => [n, '0']));
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
            <StepRow key={i} index={i} step={step} props={props} />
          ))}
        </tbody>
      </table>
      <button
        type="button"
        data-testid="step-add"
        onClick={() => onChange(insertStep(steps, steps.length, steps[steps.length - 1] ?? blank))}
      >
        + Add step
      </button>
      <StepText key={formatSteps(steps, inputs)} inputs={inputs} steps={steps} onChange={onChange} />
    </div>
  );
}
