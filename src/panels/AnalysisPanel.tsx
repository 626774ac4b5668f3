import { useEffect } from 'react';
import { followDocument, stepVector } from '../state/simulation.ts';
import { ExpectationSection, RuleSection } from './CellSections.tsx';
import { SequenceSection } from './SequenceSection.tsx';
import { TableSection } from './TableSection.tsx';
import { VectorSection } from './VectorSection.tsx';
import { PowerSection } from './PowerSection.tsx';
import './panels.css';

/** Keys that step through vectors: ignored while the designer types in a field. */
const STEP_KEYS: Readonly<Record<string, 1 | -1>> = { ']': 1, '[': -1 };

function typingTarget(target: EventTarget | null): boolean {
  return (
    target instanceof HTMLElement &&
    (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName))
  );
}

function useVectorKeys(): void {
  useEffect(() => {
    const onKey = (e: KeyboardEvent): void => {
      const step = STEP_KEYS[e.key];
      if (step === undefined || e.ctrlKey || e.metaKey || e.altKey || typingTarget(e.target)) return;
      e.preventDefault();
      stepVector(step);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
}

/**
 * The analysis workspace beside the sheet: the selected vector, every vector, expected functions,
 * structure checks, sequences, power and sizing. It follows the document store and re-solves live.
 */
export function AnalysisPanel() {
  useEffect(() => followDocument(), []);
  useVectorKeys();
  return (
    <aside className="rw-analysis" aria-label="Analysis" data-testid="analysis-panel">
      <VectorSection />
      <TableSection />
      <ExpectationSection />
      <RuleSection />
      <SequenceSection />
      <PowerSection />
    </aside>
  );
}
