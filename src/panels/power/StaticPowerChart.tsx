import { formatPower } from '../../core/view/format.ts';
import type { VectorPower } from '../../core/power/types.ts';
import { chartGeometry, DEFAULT_FRAME } from './chartGeometry.ts';

interface StaticPowerChartProps {
  readonly vectors: readonly VectorPower[];
  readonly inputs: readonly string[];
  /** 'step' for a sequence, 'vector' for the sweep. */
  readonly unit: 'vector' | 'step';
}

const AXIS = 14;

/**
 * Static power per vector as bars on a logarithmic scale, in plain SVG. A bar through a conducting
 * path is solid; a leakage-only bar is hatched, so the two read apart without colour.
 */
export function StaticPowerChart({ vectors, inputs, unit }: StaticPowerChartProps) {
  const { bars, ticks, total } = chartGeometry(vectors, inputs);
  if (ticks.length === 0) return <p className="rw-muted">No static power in any {unit}.</p>;
  const { width, height, left } = DEFAULT_FRAME;
  return (
    <figure className="rw-power-chart" data-testid="static-power-chart">
      <svg
        viewBox={`0 0 ${width} ${height + AXIS}`}
        role="img"
        aria-label={`Static power per ${unit}, log scale`}
      >
        <defs>
          <pattern
            id="rw-leak-hatch"
            width="4"
            height="4"
            patternUnits="userSpaceOnUse"
            patternTransform="rotate(45)"
          >
            <rect width="4" height="4" className="rw-bar-leak-bg" />
            <line x1="0" y1="0" x2="0" y2="4" className="rw-bar-leak-line" />
          </pattern>
        </defs>
        {ticks.map((t) => (
          <g key={t.watts}>
            <line x1={left} x2={width} y1={t.y} y2={t.y} className="rw-chart-grid" />
            <text x={left - 3} y={t.y + 3} textAnchor="end" className="rw-chart-tick">
              {formatPower(t.watts)}
            </text>
          </g>
        ))}
        {bars.map((b) => (
          <g key={b.index}>
            <rect
              x={b.x}
              y={b.y}
              width={b.width}
              height={b.height}
              className={b.kind === 'dc' ? 'rw-bar-dc' : 'rw-bar-leak'}
              fill={b.kind === 'dc' ? undefined : 'url(#rw-leak-hatch)'}
            >
              <title>{`${unit} ${b.index} (${b.label}): ${formatPower(b.watts)}${b.kind === 'dc' ? ', through a conducting path' : ', leakage only'}`}</title>
            </rect>
            {bars.length <= 16 && (
              <text
                x={b.x + b.width / 2}
                y={height + AXIS - 3}
                textAnchor="middle"
                className="rw-chart-tick rw-mono"
              >
                {b.label}
              </text>
            )}
          </g>
        ))}
      </svg>
      <figcaption className="rw-muted">
        Static power per {unit} ({inputs.join(' ')}), log scale; solid: current through a conducting path,
        hatched: leakage only.
        {bars.length < total ? ` Showing the ${bars.length} highest of ${total}.` : ''}
      </figcaption>
    </figure>
  );
}
