import type { InputVector } from '../core/model/design.ts';
import { vectorPositionText } from '../core/view/vectorControl.ts';

interface InputStripProps {
  readonly inputs: readonly string[];
  readonly vector: InputVector;
  readonly onToggle: (input: string) => void;
  readonly onStep: (step: 1 | -1) => void;
}

/** The selected vector as a row of bits: click a bit to flip it, arrows step through combinations. */
export function InputStrip({ inputs, vector, onToggle, onStep }: InputStripProps) {
  if (inputs.length === 0) return <p className="rw-muted">This cell has no input pins.</p>;
  return (
    <div className="rw-input-strip" data-testid="input-strip">
      <button
        type="button"
        aria-label="previous vector"
        title="Previous vector ([)"
        onClick={() => onStep(-1)}
      >
        ◀
      </button>
      {inputs.map((name) => {
        const value = vector[name] ?? '0';
        return (
          <button
            type="button"
            key={name}
            className={`rw-bit rw-bit-${value}`}
            data-testid={`bit-${name}`}
            aria-pressed={value === '1'}
            title={`${name} = ${value}; click to flip`}
            onClick={() => onToggle(name)}
          >
            <span className="rw-bit-name">{name}</span>
            <span className="rw-bit-value">{value}</span>
          </button>
        );
      })}
      <button type="button" aria-label="next vector" title="Next vector (])" onClick={() => onStep(1)}>
        ▶
      </button>
      <span className="rw-muted" data-testid="vector-number">
        {vectorPositionText(inputs, vector)}
      </span>
    </div>
  );
}
