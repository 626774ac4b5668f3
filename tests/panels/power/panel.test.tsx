import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { DEFAULT_TECHNOLOGY } from '../../../src/core/model/technology.ts';
import { powerReport } from '../../../src/core/power/powerReport.ts';
import { proposeWidths, sizingReport } from '../../../src/core/sizing/sizingReport.ts';
import { chartGeometry, DEFAULT_FRAME } from '../../../src/panels/power/chartGeometry.ts';
import { PowerSizingPanel } from '../../../src/panels/power/PowerSizingPanel.tsx';
import { nand, UNIT_RC_TECH } from '../../sizing/cells.ts';

const power = powerReport(nand(2), DEFAULT_TECHNOLOGY, {
  frequency: 100e6,
  activity: 'random',
  load: 10e-15,
});
const sizing = sizingReport(nand(2), UNIT_RC_TECH, { load: 10e-15 });

describe('static power chart geometry', () => {
  it('draws one bar per vector, taller for more power, on a log scale with decade ticks', () => {
    const { bars, ticks } = chartGeometry(power.vectors, ['A', 'B']);
    expect(bars.map((b) => b.label)).toEqual(['00', '01', '10', '11']);
    const heights = bars.map((b) => b.height);
    const watts = bars.map((b) => b.watts);
    for (let i = 0; i < bars.length; i++) {
      for (let j = 0; j < bars.length; j++)
        if (watts[i]! > watts[j]!) expect(heights[i]).toBeGreaterThan(heights[j]!);
    }
    // Ten times the power is one decade higher: the spacing of consecutive ticks (log scale).
    const decade = ticks[0]!.y - ticks[1]!.y;
    const [a, b] = [bars[0]!, bars[3]!];
    expect(b.height - a.height).toBeCloseTo(decade * Math.log10(b.watts / a.watts), 6);
    for (const bar of bars) expect(bar.kind).toBe('leakage');
  });

  it('keeps the highest vectors, in order, when there are more than it can draw', () => {
    const many = Array.from({ length: 10 }, (_, i) => ({ ...power.vectors[0]!, staticWatts: (i % 5) + 1 }));
    const { bars, total } = chartGeometry(many, ['A', 'B'], { ...DEFAULT_FRAME, maxBars: 4 });
    expect(total).toBe(10);
    expect(bars.map((b) => b.index)).toEqual([3, 4, 8, 9]);
  });

  it('has no ticks when nothing draws static power', () => {
    const none = power.vectors.map((v) => ({ ...v, staticWatts: 0, dcWatts: 0, leakageWatts: 0 }));
    expect(chartGeometry(none, ['A', 'B']).ticks).toEqual([]);
  });
});

describe('PowerSizingPanel', () => {
  const html = renderToStaticMarkup(<PowerSizingPanel power={power} sizing={sizing} />);

  it('names the activity convention and shows the chart, the figures and the effort table', () => {
    expect(html).toContain('0→1');
    expect(html).toContain('data-testid="static-power-chart"');
    expect(html).toContain('data-testid="effort-table-Y"');
    // NAND2 sized N 2, P 2: g = 4/3 printed to two decimals (Weste & Harris, 4th ed., table 4.2).
    expect(html).toContain('1.33');
    expect(html).toContain('GND → NB → n1 → NA → Y');
  });

  it('lists proposed widths when given a proposal', () => {
    // NAND2 drawn at width 1 against the unit inverter (N 1, P 2): all four become 2 (W&H 4th ed. §4.4).
    const proposal = proposeWidths(nand(2, 1, 1), UNIT_RC_TECH, { wn: 1, wp: 2 });
    const withProposal = renderToStaticMarkup(
      <PowerSizingPanel power={power} sizing={sizing} proposal={proposal} />,
    );
    expect(withProposal).toContain('data-testid="width-proposal"');
    expect(withProposal.match(/<td class="rw-num">2<\/td>/g)).toHaveLength(4);
  });

  it('renders without reports, with an error message when given one', () => {
    const empty = renderToStaticMarkup(
      <PowerSizingPanel power={null} sizing={null} error="--freq must be positive" />,
    );
    expect(empty).toContain('No power figures yet.');
    expect(empty).toContain('role="alert"');
    expect(empty).toContain('--freq must be positive');
  });
});
