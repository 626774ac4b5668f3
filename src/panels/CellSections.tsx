import { useCallback, useMemo } from 'react';
import { expressionNames } from '../core/analysis/check.ts';
import { severityCounts, summaryBadge } from '../core/view/summary.ts';
import { expressionProblem } from '../core/expect/problems.ts';
import { setDesignFields, useStore } from '../state/store.ts';
import { useSimulation } from '../state/simulation.ts';
import { ExpectationEditor } from './ExpectationEditor.tsx';
import { FindingList } from './FindingList.tsx';
import { pickFinding } from './pick.ts';
import { Section } from './Section.tsx';

/** Expected functions per output, saved into the design as one undoable step each. */
export function ExpectationSection() {
  const design = useStore((s) => s.design);
  const netlist = design.netlist;
  const validate = useCallback(
    (text: string) => expressionProblem(text, expressionNames(netlist)),
    [netlist],
  );
  const commit = (output: string, text: string): void => {
    const next: Record<string, string> = { ...design.expectations };
    if (text === '') delete next[output];
    else next[output] = text;
    setDesignFields({ expectations: next });
  };
  return (
    <Section title="Expected functions" testId="expectation-section">
      <ExpectationEditor
        outputs={design.netlist.outputs}
        expectations={design.expectations}
        validate={validate}
        onCommit={commit}
      />
    </Section>
  );
}

/** Structural checks of the cell, independent of any vector (from the latest sweep). */
export function RuleSection() {
  const report = useSimulation((s) => s.sweep.result?.report ?? null);
  const findings = useMemo(() => report?.findings.filter((f) => f.vector === null) ?? null, [report]);
  return (
    <Section
      title="Structure checks"
      testId="rule-section"
      open={false}
      badge={findings === null ? undefined : summaryBadge(severityCounts(findings))}
    >
      {findings === null ? (
        <p className="rw-muted">Shown once the cell is checked.</p>
      ) : (
        <FindingList
          findings={findings}
          onPick={pickFinding}
          empty="No structural problems found."
          testId="rule-findings"
        />
      )}
    </Section>
  );
}
