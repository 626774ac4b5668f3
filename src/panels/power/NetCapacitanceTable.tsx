import { useState } from 'react';
import { engineering, formatPower } from '../../core/view/format.ts';
import type { NetPower } from '../../core/power/types.ts';

function Breakdown({ net }: { readonly net: NetPower }) {
  const c = net.capacitance;
  const parts = [
    ['gates', c.gate],
    ['diffusion', c.diffusion],
    ['capacitors', c.explicit],
    ['load', c.load],
  ] as const;
  return (
    <p className="rw-power-breakdown" data-testid="capacitance-breakdown" aria-live="polite">
      <span className="rw-mono">{net.net}</span>:{' '}
      {parts.map(([name, farads]) => `${name} ${engineering(farads, 'F')}`).join(', ')}; swing{' '}
      {net.swing.toFixed(2)} V, {engineering(net.energyPerTransition, 'J')} per 0→1
    </p>
  );
}

interface NetRowProps {
  readonly net: NetPower;
  readonly highlighted: boolean;
  readonly onShow: (net: string | null) => void;
}

function NetRow({ net, highlighted, onShow }: NetRowProps) {
  return (
    <tr
      tabIndex={0}
      className={highlighted ? 'rw-selected' : undefined}
      onMouseEnter={() => onShow(net.net)}
      onFocus={() => onShow(net.net)}
      onBlur={() => onShow(null)}
    >
      <th scope="row" className="rw-mono">
        {net.net}
        {net.isInput ? ' (pin)' : ''}
      </th>
      <td className="rw-num">{engineering(net.capacitance.total, 'F')}</td>
      <td className="rw-num">{net.activity.toFixed(4)}</td>
      <td className="rw-num">{formatPower(net.watts)}</td>
    </tr>
  );
}

/**
 * Switched capacitance, activity and power per net. Pointing at (or focusing) a row shows what its
 * capacitance is made of; the highlighted row is view state only, never part of the design.
 */
export function NetCapacitanceTable({ nets }: { readonly nets: readonly NetPower[] }) {
  const [shown, setShown] = useState<string | null>(null);
  const detail = nets.find((n) => n.net === shown);
  return (
    <>
      <table className="rw-power-table" data-testid="net-power-table">
        <thead>
          <tr>
            <th scope="col">net</th>
            <th scope="col">C</th>
            <th scope="col">α</th>
            <th scope="col">power</th>
          </tr>
        </thead>
        <tbody onMouseLeave={() => setShown(null)}>
          {nets.map((n) => (
            <NetRow key={n.net} net={n} highlighted={n.net === shown} onShow={setShown} />
          ))}
        </tbody>
      </table>
      {detail === undefined ? (
        <p className="rw-muted rw-power-breakdown">Point at a net to see its capacitance.</p>
      ) : (
        <Breakdown net={detail} />
      )}
    </>
  );
}
