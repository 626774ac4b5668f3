import { engineering } from '../../core/view/format.ts';
import type { OutputSizing } from '../../core/sizing/types.ts';

/** Logical effort per input, exact ratios printed to three figures (the book's 4/3 reads 1.33). */
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
              <td className="rw-num">{engineering(output.inputCapacitance[input], 'F')}</td>
              <td className="rw-num" title={g === null ? 'drives no gate: a pass input' : undefined}>
                {g === null || g === undefined ? '—' : g.toFixed(2)}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
