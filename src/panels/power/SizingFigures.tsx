import { engineering } from '../../core/view/format.ts';
import type { ControlValue, DelayEstimate, NetworkDrive, OutputSizing } from '../../core/sizing/types.ts';
import { EffortTable } from './EffortTable.tsx';

function chainText(path: readonly string[]): string {
  return path.join(' → ');
}

function controlsText(controls: Readonly<Record<string, ControlValue>>): string {
  return Object.entries(controls)
    .map(([net, v]) => `${net}=${v}`)
    .join(' ');
}

function DriveLine({ label, drive }: { readonly label: string; readonly drive: NetworkDrive | null }) {
  if (drive === null) return <li>{label}: none</li>;
  return (
    <li>
      {label}: <strong>{engineering(drive.ohms, 'Ω')}</strong> via{' '}
      <span className="rw-mono">{chainText(drive.path)}</span>{' '}
      <span className="rw-muted">({controlsText(drive.controls)})</span>
    </li>
  );
}

function DelayLine({ label, delay }: { readonly label: string; readonly delay: DelayEstimate | null }) {
  if (delay === null) return <li>{label}: none</li>;
  return (
    <li>
      {label}: <strong>{engineering(delay.seconds, 's')}</strong> via{' '}
      <span className="rw-mono">{chainText(delay.path)}</span>{' '}
      <span className="rw-muted">({controlsText(delay.controls)})</span>
    </li>
  );
}

/** One output's drive, equivalent inverter, efforts and delay estimates. */
export function SizingFigures({ output }: { readonly output: OutputSizing }) {
  const inv = output.equivalentInverter;
  return (
    <div className="rw-power-output" data-testid={`sizing-${output.output}`}>
      <h4>Output {output.output}</h4>
      <ul className="rw-power-list">
        <DriveLine label="Worst pull-up" drive={output.pullUp} />
        <DriveLine label="Worst pull-down" drive={output.pullDown} />
        {inv !== null && (
          <li>
            Equivalent inverter: NMOS {inv.wn.toPrecision(3)} µm, PMOS {inv.wp.toPrecision(3)} µm at L {inv.l}{' '}
            µm (Cinv {engineering(inv.cin, 'F')})
          </li>
        )}
        <li>
          Parasitic delay p:{' '}
          {output.parasiticDelay === null ? '—' : `${output.parasiticDelay.toFixed(2)} p_inv`}
        </li>
        <li>Output capacitance with load: {engineering(output.outputCapacitance, 'F')}</li>
        <DelayLine label="Worst rise (Elmore)" delay={output.rise} />
        <DelayLine label="Worst fall (Elmore)" delay={output.fall} />
      </ul>
      <EffortTable output={output} />
      {output.notes.map((note) => (
        <p key={note} className="rw-muted">
          {note}
        </p>
      ))}
    </div>
  );
}
