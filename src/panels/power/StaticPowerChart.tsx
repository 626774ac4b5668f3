import { formatPower } from '../../core/view/format.ts';
import type { VectorPower } from '../../core/power/types.ts';
import { chartGeometry, DEFAULT_FRAME, type Bar, type Tick } from './chartGeometry.ts';

interface StaticPowerChartProps {
  readonly vectors: readonly VectorPower[];
  readonly inputs: readonly string[];
  /** 'step' for a sequence, 'vector' for the sweep. */
  readonly unit: 'vector' | 'step';
}

/** Height of the band under the plot for the vector labels, pixels. */
const AXIS = 14;
/** Labels under the bars only while they fit. */
const MAX_LABELLED_BARS = 16;

function HatchPattern() {
  return (
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
  );
}

function TickLine({ tick }: { readonly tick: Tick }) {
  const { left, width } = DEFAULT_FRAME;
  return (
    <g>
      <line x1={left} x2={width} y1={tick.y} y2={tick.y} className="rw-chart-grid" />
      <text x={left - 3} y={tick.y + 3} textAnchor="end" className="rw-chart-tick">
        {formatPower(tick.watts)}
      </text>
    </g>
  );
}

function BarMark({
  bar,
  unit,
  labelled,
}: {
  readonly bar: Bar;
  readonly unit: string;
  readonly labelled: boolean;
}) {
  const dc = bar.kind === 'dc';
  const what = dc ? 'through a conducting path' : 'leakage only';
  return (
    <g>
      <rect
        x={bar.x}
        y={bar.y}
        width={bar.width}
        height={bar.height}
        className={dc ? 'rw-bar-dc' : 'rw-bar-leak'}
        fill={dc ? undefined : 'url(#rw-leak-hatch)'}
      >
        <title>{`${unit} ${bar.index} (${bar.label}): ${formatPower(bar.watts)}, ${what}`}</title>
      </rect>
      {labelled && (
        <text
          x={bar.x + bar.width / 2}
          y={DEFAULT_FRAME.height + AXIS - 3}
          textAnchor="middle"
          className="rw-chart-tick rw-mono"
        >
          {bar.label}
        </text>
      )}
    </g>
  );
}

/**
 * Static power per vector as bars on a logarithmic scale, in plain SVG. A bar through a conducting
 * path is solid; a leakage-only bar is hatched, so the two read apart without colour.
 */
export function StaticPowerChart({ vectors, inputs, unit }: StaticPowerChartProps) {
  const { bars, ticks, total } = chartGeometry(vectors, inputs);
  if (ticks.length === 0) return <p className="rw-muted">No static power in any {unit}.</p>;
  const { width, height } = DEFAULT_FRAME;
  return (
    <figure className="rw-power-chart" data-testid="static-power-chart">
      <svg
        viewBox={`0 0 ${width} ${height + AXIS}`}
        role="img"
        aria-label={`Static power per ${unit}, log scale`}
      >
        <HatchPattern />
        {ticks.map((t) => (
          <TickLine key={t.watts} tick={t} />
        ))}
        {bars.map((b) => (
          <BarMark key={b.index} bar={b} unit={unit} labelled={bars.length <= MAX_LABELLED_BARS} />
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
