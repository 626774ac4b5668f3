import { CAUTION } from '../../core/caution.ts';
import { formatPower, engineering } from '../../core/view/format.ts';
import type { PowerReport } from '../../core/power/types.ts';
import type { WidthProposal } from '../../core/sizing/proposeWidths.ts';
import type { SizingReport } from '../../core/sizing/types.ts';
import { ProposalTable } from './ProposalTable.tsx';
import { NetCapacitanceTable } from './NetCapacitanceTable.tsx';
import { SizingFigures } from './SizingFigures.tsx';
import { StaticPowerChart } from './StaticPowerChart.tsx';
import './power.css';

export interface PowerSizingPanelProps {
  /** Null until the power analysis has run (or when it failed: see `error`). */
  readonly power: PowerReport | null;
  readonly sizing: SizingReport | null;
  /** A message to show in place of the figures, e.g. a rejected option. */
  readonly error?: string | null;
  /** Widths proposed by `proposeWidths` for a reference inverter's drive, when the designer asked. */
  readonly proposal?: WidthProposal | null;
}

function Figure({ label, value }: { readonly label: string; readonly value: string }) {
  return (
    <>
      <dt>{label}</dt>
      <dd className="rw-num">{value}</dd>
    </>
  );
}

function PowerFigures({ power }: { readonly power: PowerReport }) {
  const inputs = Object.keys(power.vectors[0]?.inputs ?? {});
  const unit = power.activitySource === 'sequence' ? 'step' : 'vector';
  return (
    <div data-testid="power-figures">
      <dl className="rw-power-figures">
        <Figure label="Static (mean)" value={formatPower(power.averageStaticWatts)} />
        <Figure label="Dynamic" value={formatPower(power.dynamicWatts)} />
        <Figure label="Total" value={formatPower(power.totalWatts)} />
        <Figure label="Input pins" value={formatPower(power.inputPinWatts)} />
        <Figure label="Clock" value={engineering(power.frequency, 'Hz')} />
        <Figure label="VDD" value={`${power.vdd} V`} />
        <Figure label="Output load" value={engineering(power.load, 'F')} />
      </dl>
      <p className="rw-muted rw-power-convention">{power.convention}</p>
      <StaticPowerChart vectors={power.vectors} inputs={inputs} unit={unit} />
      <p className="rw-muted rw-power-convention">{power.leakageModel}</p>
      <NetCapacitanceTable nets={power.nets} />
      {power.notes.map((note) => (
        <p key={note} className="rw-muted">
          {note}
        </p>
      ))}
    </div>
  );
}

/**
 * What the cell costs and how it should be sized: a pure view of a power report and a sizing
 * report. It holds no design state; the workspace computes the reports and passes them in.
 */
export function PowerSizingPanel({ power, sizing, error = null, proposal = null }: PowerSizingPanelProps) {
  return (
    <div className="rw-power" data-testid="power-sizing-panel">
      {error !== null && (
        <p className="rw-error-text" role="alert">
          {error}
        </p>
      )}
      <h4>Power</h4>
      {power === null ? <p className="rw-muted">No power figures yet.</p> : <PowerFigures power={power} />}
      <h4>Sizing</h4>
      {sizing === null ? (
        <p className="rw-muted">No sizing figures yet.</p>
      ) : (
        <>
          <p className="rw-muted rw-power-convention">{sizing.convention}</p>
          {sizing.outputs.length === 0 && <p className="rw-muted">This cell has no outputs to size.</p>}
          {sizing.outputs.map((o) => (
            <SizingFigures key={o.output} output={o} />
          ))}
          {proposal !== null && <ProposalTable proposal={proposal} />}
        </>
      )}
      <p className="rw-muted">{CAUTION}</p>
    </div>
  );
}
