import { engineering } from '../../core/view/format.ts';
import type { OutputSizing } from '../../core/sizing/types.ts';

function effortText(g: number | null | undefined): string {
  return g === null || g === undefined ? '—' : g.toFixed(2);
}

/**
 * Logical effort per input to two decimals (the book's 4/3 reads 1.33): against the inverter of
 * equal drive, and for the rising and falling transitions apart (they differ in ratioed stages).
 */
export function EffortTable({ output }: { readonly output: OutputSizing }) {
  const inputs = Object.keys(output.inputCapacitance);
  if (inputs.length === 0) return null;
  return (
    <table className="rw-power-table" data-testid={`effort-table-${output.output}`}>
      <caption className="rw-muted">Logical effort into {output.output}</caption>
      <thead>
        <tr>
          <th scope="col">input</th>
          <th scope="col">Cin</th>
          <th scope="col">g = Cin / Cinv</th>
          <th scope="col">g rise</th>
          <th scope="col">g fall</th>
        </tr>
      </thead>
      <tbody>
        {inputs.map((input) => {
          const g = output.logicalEffort[input];
          return (
            <tr key={input}>
              <th scope="row" className="rw-mono">
                {input}
              </th>
              <td className="rw-num">{engineering(output.inputCapacitance[input] ?? NaN, 'F')}</td>
              <td className="rw-num" title={g === null ? 'drives no gate: a pass input' : undefined}>
                {effortText(g)}
              </td>
              <td className="rw-num">{effortText(output.logicalEffortRise[input])}</td>
              <td className="rw-num">{effortText(output.logicalEffortFall[input])}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
