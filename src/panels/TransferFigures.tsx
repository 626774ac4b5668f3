import type { CurveFigures, MarginConvention } from '../core/dc/figures.ts';

interface TransferFiguresProps {
  readonly output: string;
  readonly figures: CurveFigures;
  readonly convention: MarginConvention;
}

const ROWS: readonly { key: keyof Omit<CurveFigures, 'levels'>; name: string; what: string }[] = [
  { key: 'vm', name: 'VM', what: 'switching threshold, Vout = Vin' },
  { key: 'vil', name: 'VIL', what: 'highest input read as low (|gain| = 1)' },
  { key: 'vih', name: 'VIH', what: 'lowest input read as high (|gain| = 1)' },
  { key: 'vol', name: 'VOL', what: 'output low level' },
  { key: 'voh', name: 'VOH', what: 'output high level' },
  { key: 'nml', name: 'NML', what: 'low noise margin, VIL − VOL' },
  { key: 'nmh', name: 'NMH', what: 'high noise margin, VOH − VIH' },
];

/** The figures of one output's curve, to the millivolt, each named and explained. */
export function TransferFigures({ output, figures, convention }: TransferFiguresProps) {
  return (
    <table className="rw-nets rw-figures-table" data-testid="transfer-figures">
      <caption className="rw-muted">
        {output}: VOL and VOH{' '}
        {convention === 'rails' ? 'with the input at the rails' : 'at the unity-gain points'}
      </caption>
      <tbody>
        {ROWS.map((r) => {
          const value = figures[r.key];
          return (
            <tr key={r.key}>
              <th scope="row">{r.name}</th>
              <td className="rw-num" data-testid={`figure-${r.key}`}>
                {value === null ? '—' : `${value.toFixed(3)} V`}
              </td>
              <td className="rw-muted">{r.what}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
