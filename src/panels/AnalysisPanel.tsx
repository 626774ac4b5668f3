import { useEffect } from 'react';
import { followDocument } from '../state/simulation.ts';
import { ExpectationSection, RuleSection } from './CellSections.tsx';
import { SequenceSection } from './SequenceSection.tsx';
import { TableSection } from './TableSection.tsx';
import { VectorSection } from './VectorSection.tsx';
import { PowerSection } from './PowerSection.tsx';
import './panels.css';

/**
 * The analysis workspace beside the sheet: the selected vector, every vector, expected functions,
 * structure checks, sequences, power and sizing. It follows the document store and re-solves live.
 */
export function AnalysisPanel() {
  useEffect(() => followDocument(), []);
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
