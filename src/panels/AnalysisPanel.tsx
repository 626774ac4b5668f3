import { ExpectationSection, RuleSection } from './CellSections.tsx';
import { SequenceSection } from './SequenceSection.tsx';
import { TableSection } from './TableSection.tsx';
import { VectorSection } from './VectorSection.tsx';
import { PowerSection } from './PowerSection.tsx';
import { TransferSection } from './TransferSection.tsx';
import { CompareSection } from './CompareSection.tsx';
import { ProofSection } from './ProofSection.tsx';
import './panels.css';

/**
 * The analysis workspace beside the sheet: the selected vector, every vector, expected functions,
 * structure checks, sequences, the DC transfer curve, power and sizing, the proof for every vector
 * and the comparison with a cell from a file. It only renders the simulation slice, which the
 * analysis wiring (src/state/analysis.ts, started at start-up) keeps up to date.
 */
export function AnalysisPanel() {
  return (
    <aside className="rw-analysis" aria-label="Analysis" data-testid="analysis-panel">
      <VectorSection />
      <TableSection />
      <ProofSection />
      <ExpectationSection />
      <RuleSection />
      <SequenceSection />
      <TransferSection />
      <PowerSection />
      <CompareSection />
    </aside>
  );
}
