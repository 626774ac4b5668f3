import { useMemo } from 'react';
import { countOf } from '../core/view/plural.ts';
import type { InputVector } from '../core/model/design.ts';
import { levelStrips } from '../core/view/levelStrip.ts';
import { setDesignFields, useStore } from '../state/store.ts';
import {
  cancelJob,
  pickStep,
  runSequence,
  selectSequence,
  setStripNets,
  useSimulation,
} from '../state/simulation.ts';
import { FindingList } from './FindingList.tsx';
import { JobBar } from './JobBar.tsx';
import { LevelStripView } from './LevelStripView.tsx';
import { pickFinding } from './pick.ts';
import { Section } from './Section.tsx';
import { StepEditor } from './StepEditor.tsx';

function NetChooser({ nets, chosen }: { nets: readonly string[]; chosen: readonly string[] }) {
  const toggle = (net: string): void =>
    setStripNets(
      chosen.includes(net)
        ? chosen.filter((n) => n !== net)
        : nets.filter((n) => n === net || chosen.includes(n)),
    );
  return (
    <fieldset className="rw-net-chooser" data-testid="strip-nets">
      <legend>Nets in the strip</legend>
      {nets.map((net) => (
        <label key={net}>
          <input type="checkbox" checked={chosen.includes(net)} onChange={() => toggle(net)} /> {net}
        </label>
      ))}
    </fieldset>
  );
}

function SequenceResult() {
  const job = useSimulation((s) => s.sequence);
  const netlist = useStore((s) => s.design.netlist);
  const chosen = useSimulation((s) => s.stripNets);
  const selectedStep = useSimulation((s) => s.selectedStep);
  const nets = [...netlist.inputs, ...netlist.outputs];
  const shownNets = chosen.length > 0 ? chosen : nets;
  const strips = useMemo(() => levelStrips(job.result?.stepLevels ?? [], shownNets), [job.result, shownNets]);
  if (job.status === 'running' && job.long)
    return <JobBar label="Running steps" progress={job.progress} onCancel={() => cancelJob('sequence')} />;
  if (job.status === 'failed')
    return (
      <p className="rw-error-text" role="alert">
        {job.error}
      </p>
    );
  if (job.result === null) return null;
  const allNets = job.result.stepLevels === undefined ? [] : Object.keys(job.result.stepLevels[0] ?? {});
  const stepFindings = job.result.report.findings.filter((f) => f.vector !== null);
  return (
    <div>
      <LevelStripView
        strips={strips}
        steps={job.result.stepLevels?.length ?? 0}
        selectedStep={selectedStep}
        onPickStep={pickStep}
      />
      <NetChooser nets={allNets} chosen={shownNets} />
      <h4>Findings over the steps</h4>
      <FindingList
        findings={stepFindings}
        onPick={pickFinding}
        empty="No findings over these steps."
        testId="sequence-findings"
      />
    </div>
  );
}

/** Sequences: pick one, edit its steps, run it with stored charge carried, read the strips. */
export function SequenceSection() {
  const design = useStore((s) => s.design);
  const index = useSimulation((s) => s.sequenceIndex);
  const selectedStep = useSimulation((s) => s.selectedStep);
  const sequences = design.sequences;
  const current = sequences[index] ?? null;
  const steps = current?.steps ?? [];
  const save = (next: InputVector[]): void => {
    const name = current?.name ?? 'steps';
    const updated =
      current === null
        ? [...sequences, { name, steps: next }]
        : sequences.map((s, i) => (i === index ? { ...s, steps: next } : s));
    setDesignFields({ sequences: updated });
  };
  return (
    <Section title="Sequences" testId="sequence-section" open={sequences.length > 0}>
      <div className="rw-row">
        <select
          data-testid="sequence-choice"
          value={index}
          onChange={(e) => selectSequence(Number(e.target.value))}
        >
          {sequences.length === 0 && <option value={0}>new sequence</option>}
          {sequences.map((s, i) => (
            <option key={`${s.name}-${i}`} value={i}>
              {s.name} ({countOf(s.steps.length, 'step')})
            </option>
          ))}
        </select>
        <button
          type="button"
          data-testid="sequence-run"
          disabled={steps.length === 0}
          onClick={() => void runSequence()}
        >
          Run steps
        </button>
      </div>
      <StepEditor
        inputs={design.netlist.inputs}
        steps={steps}
        selectedStep={selectedStep}
        onChange={save}
        onPickStep={pickStep}
      />
      <SequenceResult />
    </Section>
  );
}
