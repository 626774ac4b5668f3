import { useState } from 'react';
import { engineering } from '../core/view/format.ts';
import type { PowerSettings } from '../core/power/settings.ts';
import { useStore } from '../state/store.ts';
import { computePowerAndSizing, setPowerSettings, useSimulation } from '../state/simulation.ts';
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
        value={settings.frequency}
        onCommit={(frequency) => update({ frequency })}
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
  const settings = useSimulation((s) => s.powerSettings);
  const power = useSimulation((s) => s.power);
  const sizing = useSimulation((s) => s.sizing);
  const bySequence = settings.activity === 'sequence';
  const sourceRunning = useSimulation((s) => (bySequence ? s.sequence : s.sweep).status === 'running');
  const busy = sourceRunning || sizing.status === 'running';
  const sequenceIndex = useSimulation((s) => s.sequenceIndex);
  const hasSequence = useStore((s) => (s.design.sequences[sequenceIndex]?.steps.length ?? 0) > 0);
  const powerError = useSimulation((s) => s.powerError);
  const error = powerError ?? sizing.error ?? sizing.result?.error ?? null;
  const idle = power === null && !busy;
  // Folded, the section shows only its badge: the per-net tables (a row per net, hundreds on a
  // large cell) are built when it is unfolded, not on every check of a folded section.
  const [unfolded, setUnfolded] = useState(false);
  return (
    <Section
      title="Power and sizing"
      testId="power-section"
      open={false}
      onToggle={setUnfolded}
      badge={power ? engineering(power.totalWatts, 'W') : undefined}
    >
      <Settings settings={settings} hasSequence={hasSequence} />
      {idle && (
        <button type="button" onClick={() => void computePowerAndSizing()}>
          Compute power and sizing
        </button>
      )}
      {busy && (
        <p className="rw-muted">
          {sourceRunning
            ? `Counting power on ${bySequence ? "the sequence's steps" : 'the check of every vector'}…`
            : 'Computing…'}
        </p>
      )}
      {unfolded && <PowerSizingPanel power={power} sizing={sizing.result?.sizing ?? null} error={error} />}
    </Section>
  );
}
