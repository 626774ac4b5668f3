import { useState } from 'react';
import { engineering } from '../core/view/format.ts';
import { cancelJob, setPowerSettings, startPower, useSimulation } from '../state/simulation.ts';
import { JobBar } from './JobBar.tsx';
import type { PowerSettings } from '../worker/protocol.ts';
import { PowerSizingPanel } from './power/PowerSizingPanel.tsx';
import { Section } from './Section.tsx';

/** A positive number typed in a unit (MHz, fF); null when it is not one. */
function parseScaled(text: string, unit: number): number | null {
  const value = Number(text.trim());
  return text.trim() !== '' && Number.isFinite(value) && value >= 0 ? value * unit : null;
}

function NumberSetting({
  label,
  unit,
  scale,
  value,
  onCommit,
}: {
  label: string;
  unit: string;
  scale: number;
  value: number;
  onCommit: (v: number) => void;
}) {
  const [draft, setDraft] = useState(String(Number((value / scale).toPrecision(6))));
  const parsed = parseScaled(draft, scale);
  return (
    <label className="rw-setting">
      {label}
      <input
        type="text"
        inputMode="decimal"
        size={6}
        value={draft}
        aria-invalid={parsed === null}
        onChange={(e) => setDraft(e.target.value)}
        onBlur={() => parsed !== null && parsed !== value && onCommit(parsed)}
        onKeyDown={(e) => e.key === 'Enter' && parsed !== null && parsed !== value && onCommit(parsed)}
      />
      {unit}
      {parsed === null && <span className="rw-error-text"> enter a number ≥ 0</span>}
    </label>
  );
}

function Settings({ settings, hasSequence }: { settings: PowerSettings; hasSequence: boolean }) {
  const update = (patch: Partial<PowerSettings>): void => setPowerSettings({ ...settings, ...patch });
  return (
    <div className="rw-row rw-power-settings">
      <NumberSetting
        label="Clock"
        unit="MHz"
        scale={1e6}
        value={settings.freq}
        onCommit={(freq) => update({ freq })}
      />
      <NumberSetting
        label="Load"
        unit="fF"
        scale={1e-15}
        value={settings.load}
        onCommit={(load) => update({ load })}
      />
      <label className="rw-setting">
        Activity{' '}
        <select
          value={settings.activity}
          onChange={(e) => update({ activity: e.target.value as PowerSettings['activity'] })}
        >
          <option value="random">every vector equally likely</option>
          <option value="sequence" disabled={!hasSequence}>
            the chosen sequence
          </option>
        </select>
      </label>
    </div>
  );
}

/** Power and sizing: the settings, then the power engineer's figures for the current cell. */
export function PowerSection() {
  const job = useSimulation((s) => s.power);
  const settings = useSimulation((s) => s.powerSettings);
  const hasSequence = useSimulation((s) => (s.design?.sequences[s.sequenceIndex]?.steps.length ?? 0) > 0);
  const result = job.result;
  const error = job.error ?? (result !== null && result.errors.length > 0 ? result.errors.join('; ') : null);
  return (
    <Section
      title="Power and sizing"
      testId="power-section"
      open={false}
      badge={result?.power ? engineering(result.power.totalWatts, 'W') : undefined}
    >
      <Settings settings={settings} hasSequence={hasSequence} />
      {(job.status === 'idle' || job.status === 'cancelled') && (
        <button type="button" onClick={() => void startPower()}>
          Compute power and sizing
        </button>
      )}
      {job.status === 'running' &&
        (job.long ? (
          <JobBar label="Computing power" progress={job.progress} onCancel={() => cancelJob('power')} />
        ) : (
          <p className="rw-muted">Computing…</p>
        ))}
      {job.status === 'cancelled' && <p className="rw-muted">Cancelled.</p>}
      <PowerSizingPanel power={result?.power ?? null} sizing={result?.sizing ?? null} error={error} />
    </Section>
  );
}
