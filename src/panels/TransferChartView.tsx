import type { TransferChart } from '../core/view/transferChart.ts';

/**
 * Draws a transfer chart's geometry (core/view/transferChart.ts) as SVG: nothing is computed here.
 * Every mark carries its own text label, so nothing is told by colour alone.
 */
export function TransferChartView({ chart }: { readonly chart: TransferChart }) {
  const { size, plot } = chart;
  const bottom = plot.y + plot.height;
  return (
    <svg
      className="rw-chart"
      viewBox={`0 0 ${size.width} ${size.height}`}
      role="img"
      aria-label={chart.summary}
      data-testid="transfer-chart"
    >
      <rect className="rw-chart-plot" x={plot.x} y={plot.y} width={plot.width} height={plot.height} />
      {chart.xTicks.map((t) => (
        <g key={`x${t.value}`}>
          <line className="rw-chart-grid" x1={t.at} y1={plot.y} x2={t.at} y2={bottom} />
          <text className="rw-chart-tick" x={t.at} y={chart.xTickBaseline} textAnchor="middle">
            {t.label}
          </text>
        </g>
      ))}
      {chart.yTicks.map((t) => (
        <g key={`y${t.value}`}>
          <line className="rw-chart-grid" x1={plot.x} y1={t.at} x2={plot.x + plot.width} y2={t.at} />
          <text className="rw-chart-tick" x={plot.x - 4} y={t.at + 3} textAnchor="end">
            {t.label}
          </text>
        </g>
      ))}
      <text className="rw-chart-title" x={chart.xTitle.x} y={chart.xTitle.y} textAnchor="middle">
        {chart.xTitle.text}
      </text>
      <text className="rw-chart-title" x={chart.yTitle.x} y={chart.yTitle.y} textAnchor="start">
        {chart.yTitle.text}
      </text>
      <line
        className="rw-chart-diagonal"
        x1={chart.diagonal[0]}
        y1={chart.diagonal[1]}
        x2={chart.diagonal[2]}
        y2={chart.diagonal[3]}
      />
      {chart.curves.map((c) => (
        <g key={c.output} className={c.chosen ? 'rw-chart-curve rw-chosen' : 'rw-chart-curve'}>
          <path d={c.path} strokeDasharray={c.dash || undefined} data-testid={`curve-${c.output}`} />
          <line
            x1={c.legend.sample[0]}
            y1={c.legend.sample[1]}
            x2={c.legend.sample[2]}
            y2={c.legend.sample[3]}
            strokeDasharray={c.dash || undefined}
          />
          <text x={c.legend.x} y={c.legend.y}>
            {c.legend.text}
          </text>
        </g>
      ))}
      {chart.marks.map((m) => (
        <g key={m.figure} className={`rw-chart-mark rw-mark-${m.figure}`} data-testid={`mark-${m.figure}`}>
          {m.lines.map(([x1, y1, x2, y2], i) => (
            <line key={i} x1={x1} y1={y1} x2={x2} y2={y2} />
          ))}
          {m.point !== null &&
            (m.figure === 'vm' ? (
              <circle cx={m.point.x} cy={m.point.y} r={3.5} />
            ) : (
              <rect x={m.point.x - 3} y={m.point.y - 3} width={6} height={6} />
            ))}
          <text x={m.labelAt.x} y={m.labelAt.y} textAnchor={m.labelAt.anchor}>
            {m.text}
          </text>
        </g>
      ))}
    </svg>
  );
}
