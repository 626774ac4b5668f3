import type { DcComparison } from '../core/dc/vectorCompare.ts';
import { formatCurrent, formatVolts } from '../core/view/format.ts';
import { AUTO_VECTOR_DC_DEVICES } from '../state/analysis.ts';
import { startVectorDc } from '../state/dc.ts';
import { useStore } from '../state/store.ts';
import { useSimulation } from '../state/simulation.ts';

/** Marked where the two answers disagree: a glyph and a word, never colour alone. */
function Differs({ differs }: { readonly differs: boolean }) {
  return differs ? (
    <span className="rw-differs" title="the level-1 answer and the switch-level estimate disagree">
      ≠ differs
    </span>
  ) : null;
}

function Table({ c }: { readonly c: DcComparison }) {
  return (
    <table className="rw-nets" data-testid="vector-dc">
      <thead>
        <tr>
          <th scope="col" />
          <th scope="col">switch level</th>
          <th scope="col">level-1 DC</th>
          <th scope="col" />
        </tr>
      </thead>
      <tbody>
        {c.outputs.map((o) => (
          <tr key={o.name} data-testid={`vector-dc-${o.name}`}>
            <th scope="row">{o.name}</th>
            <td className="rw-num">
              {o.level} · {formatVolts(o.switchVolts)}
            </td>
            <td className="rw-num" data-testid="dc-volts">
              {o.dcVolts === null ? 'none' : formatVolts(o.dcVolts)}
            </td>
            <td>
              <Differs differs={o.differs} />
            </td>
          </tr>
        ))}
        <tr data-testid="vector-dc-current">
          <th scope="row">supply current</th>
          <td className="rw-num">{formatCurrent(c.switchCurrent)}</td>
          <td className="rw-num">{c.dcCurrent === null ? 'none' : formatCurrent(c.dcCurrent)}</td>
          <td>
            <Differs differs={c.currentDiffers} />
          </td>
        </tr>
      </tbody>
    </table>
  );
}

/**
 * The shown vector's outputs and supply current by the level-1 DC model, beside the switch-level
 * estimate, computed in the worker; only the answer for the vector on show is ever drawn.
 */
export function VectorDcFigures() {
  const dc = useSimulation((s) => s.vectorDc);
  const comparison = dc.status === 'done' ? (dc.result?.comparison ?? null) : null;
  const devices = useStore((s) => s.design.netlist.devices.length);
  const large = devices > AUTO_VECTOR_DC_DEVICES;
  return (
    <>
      <h4>Level-1 DC beside the switch-level estimate</h4>
      {dc.status === 'running' && <p className="rw-muted">Solving the operating point…</p>}
      {dc.status === 'idle' &&
        (large ? (
          <p className="rw-muted">
            {devices} devices: solved on request.{' '}
            <button type="button" onClick={() => void startVectorDc()}>
              Solve
            </button>
          </p>
        ) : (
          <p className="rw-muted">Solved once edits pause, after the table.</p>
        ))}
      {(dc.status === 'cancelled' || dc.status === 'failed') && (
        <p className={dc.status === 'failed' ? 'rw-error-text' : 'rw-muted'}>
          {dc.error ?? 'Not solved.'}{' '}
          <button type="button" onClick={() => void startVectorDc()}>
            Solve
          </button>
        </p>
      )}
      {dc.result?.error && <p className="rw-error-text">{dc.result.error}</p>}
      {comparison !== null && <Table c={comparison} />}
      {comparison?.notes.map((n) => (
        <p key={n} className="rw-muted">
          ⓘ {n}
        </p>
      ))}
    </>
  );
}
