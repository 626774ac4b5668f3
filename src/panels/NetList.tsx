import { formatVolts } from '../core/view/format.ts';
import { PROBLEM_GLYPHS, lookOf, problemMarks, type NetState } from '../core/view/visualLanguage.ts';

interface NetListProps {
  readonly nets: readonly (readonly [string, NetState])[];
  readonly onPick: (net: string) => void;
}

/** Every net's level and estimated voltage for the selected vector, with its problem badges. */
export function NetList({ nets, onPick }: NetListProps) {
  return (
    <table className="rw-nets" data-testid="net-list">
      <tbody>
        {nets.map(([name, state]) => {
          const look = lookOf(state);
          return (
            <tr key={name} data-testid={`net-${name}`} onClick={() => onPick(name)}>
              <td className="rw-mono">{name}</td>
              <td>
                <span className={`rw-swatch rw-look-${look.name}`} aria-hidden="true" />
                <span className="rw-mono">{look.mark}</span>
              </td>
              <td className="rw-num">{formatVolts(state.volts)}</td>
              <td>
                {problemMarks(state).map((m) => (
                  <span key={m} className="rw-badge" title={m}>
                    {PROBLEM_GLYPHS[m]} {m}
                  </span>
                ))}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
