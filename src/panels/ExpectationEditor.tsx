import { useState } from 'react';
import { type ExpressionProblem } from '../core/expect/problems.ts';
import { tokenSpan } from '../core/view/expectation.ts';

interface ExpectationEditorProps {
  readonly outputs: readonly string[];
  readonly expectations: Readonly<Record<string, string>>;
  /** Returns the first problem in the text, or null when it parses. */
  readonly validate: (text: string) => ExpressionProblem | null;
  /** Called only with text that parses (or empty text, which removes the expectation). */
  readonly onCommit: (output: string, text: string) => void;
}

function ProblemView({ text, problem }: { text: string; problem: ExpressionProblem }) {
  const [start, end] = tokenSpan(text, problem.position);
  return (
    <div className="rw-parse-error" role="alert" data-testid="expectation-error">
      <code>
        {text.slice(0, start)}
        <mark>{text.slice(start, end) || ' '}</mark>
        {text.slice(end)}
      </code>
      <span>
        ✗ column {problem.position + 1}: {problem.message}
      </span>
    </div>
  );
}

function OutputRow({
  output,
  saved,
  validate,
  onCommit,
}: { output: string; saved: string } & Pick<ExpectationEditorProps, 'validate' | 'onCommit'>) {
  const [draft, setDraft] = useState(saved);
  const [problem, setProblem] = useState<ExpressionProblem | null>(null);
  const commit = (): void => {
    const text = draft.trim();
    const found = text === '' ? null : validate(text);
    setProblem(found);
    if (found === null && text !== saved) onCommit(output, text);
  };
  return (
    <li className="rw-expect-row">
      <label>
        <span className="rw-mono">{output} =</span>
        <input
          type="text"
          spellCheck={false}
          data-testid={`expect-${output}`}
          value={draft}
          placeholder="no expected function"
          aria-invalid={problem !== null}
          onChange={(e) => setDraft(e.target.value)}
          onBlur={commit}
          onKeyDown={(e) => {
            if (e.key === 'Enter') commit();
            if (e.key === 'Escape') {
              setDraft(saved);
              setProblem(null);
            }
          }}
        />
      </label>
      {problem !== null && <ProblemView text={draft.trim()} problem={problem} />}
    </li>
  );
}

/**
 * Expected functions per output, edited in place. Press Enter (or leave the field) to apply; text
 * that does not parse is kept in the field with the bad token marked and is never saved.
 */
export function ExpectationEditor({ outputs, expectations, validate, onCommit }: ExpectationEditorProps) {
  if (outputs.length === 0) return <p className="rw-muted">This cell has no output pins.</p>;
  return (
    <div>
      <ul className="rw-expectations">
        {outputs.map((o) => (
          <OutputRow
            key={`${o}:${expectations[o] ?? ''}`}
            output={o}
            saved={expectations[o] ?? ''}
            validate={validate}
            onCommit={onCommit}
          />
        ))}
      </ul>
      <p className="rw-muted">
        Operators: ! not, &amp; and, | or, ^ exclusive or, S ? A : B select, constants 0 1, Z for a released
        output.
      </p>
    </div>
  );
}
