/**
 * The chart geometry of the transfer-curve view, read without a browser. The curve is the matched
 * inverter of Weste & Harris, CMOS VLSI Design, 4th ed. (2011), example 2.17: VDD 1.0 V, Vt 0.35 V,
 * kn = kp, so VM = 0.5 V, VIL 0.46 V, VIH 0.54 V, VOL 0.04 V, VOH 0.96 V with the levels at the
 * unity-gain points (the book's convention), VOL 0 and VOH VDD at the rails.
 */
import { describe, expect, it } from 'vitest';
import { inConvention } from '../../src/core/dc/figures.ts';
import { transferCurves, type TransferReport } from '../../src/core/dc/transfer.ts';
import { circuit } from '../../src/core/model/builder.ts';
import { niceTicks, transferChart, type ChartMark } from '../../src/core/view/transferChart.ts';
import { cmosInverter, squareLaw } from '../dc/helpers.ts';

const WH = squareLaw({ vdd: 1.0, vtn: 0.35, vtp: 0.35, kpn: 100e-6, kpp: 100e-6 });
const report = transferCurves(cmosInverter(1, 1, 0.5), WH, { input: 'A', points: 101 });
const SIZE = { width: 340, height: 320 };

function mark(marks: readonly ChartMark[], figure: ChartMark['figure']): ChartMark {
  const m = marks.find((x) => x.figure === figure);
  if (m === undefined) throw new Error(`no ${figure} mark`);
  return m;
}

describe('axes', () => {
  it('run from 0 to VDD with round ticks', () => {
    expect(niceTicks(1).map((t) => t.label)).toEqual(['0.0', '0.2', '0.4', '0.6', '0.8', '1.0']);
    expect(niceTicks(2.5).map((t) => t.value)).toEqual([0, 0.5, 1, 1.5, 2, 2.5]);
    expect(niceTicks(3.3).map((t) => t.label)).toEqual(['0', '1', '2', '3']);
  });

  it('map volts onto the plot: 0 V at the bottom left, VDD at the top right', () => {
    const chart = transferChart(report, 'Y', 'unity-gain', SIZE);
    const { plot } = chart;
    expect(chart.vdd).toBe(1);
    expect(chart.diagonal).toEqual([plot.x, plot.y + plot.height, plot.x + plot.width, plot.y]);
    expect(chart.xTicks[0]?.at).toBe(plot.x);
    expect(chart.yTicks[chart.yTicks.length - 1]?.at).toBe(plot.y);
    expect(chart.xTitle.text).toBe('V(A) [V]');
    expect(chart.xTickBaseline).toBeGreaterThan(plot.y + plot.height);
  });
});

describe('the curve and its figures', () => {
  const chart = transferChart(report, 'Y', 'unity-gain', SIZE);
  const { plot } = chart;
  const x = (v: number): number => plot.x + v * plot.width;
  const y = (v: number): number => plot.y + plot.height - v * plot.height;

  it('draws the curve from (0, VDD) to (VDD, 0) in one stroke', () => {
    const [curve] = chart.curves;
    expect(curve?.path.startsWith(`M${x(0)} ${y(1)}`)).toBe(true);
    expect(curve?.path.match(/M/g)).toHaveLength(1);
    expect(curve?.path.match(/L/g)).toHaveLength(100);
    expect(curve?.legend.text).toBe('Y');
  });

  it('marks VM on the line Vout = Vin, at 0.5 V', () => {
    const vm = mark(chart.marks, 'vm');
    expect(vm.point?.x).toBeCloseTo(x(0.5), 1);
    expect(vm.point?.y).toBeCloseTo(y(0.5), 1);
    expect(vm.text).toBe('VM 0.50 V');
  });

  it('marks VIL and VIH with a guide down to the input axis, and labels every figure', () => {
    const vil = mark(chart.marks, 'vil');
    expect(vil.text).toBe('VIL 0.46 V');
    expect(vil.point?.x).toBeCloseTo(x(0.4625), 1);
    // At VIL the output is still near VOH = 0.96 V (the book's two decimals: within 5 mV).
    expect(Math.abs((vil.point?.y as number) - y(0.96))).toBeLessThan(0.0051 * plot.height);
    expect(vil.lines[0]?.[3]).toBe(plot.y + plot.height);
    expect(mark(chart.marks, 'vih').text).toBe('VIH 0.54 V');
    expect(mark(chart.marks, 'vol').text).toBe('VOL 0.04 V');
    expect(mark(chart.marks, 'voh').text).toBe('VOH 0.96 V');
    expect(mark(chart.marks, 'nml').text).toBe('NML 0.42 V');
    expect(mark(chart.marks, 'nmh').text).toBe('NMH 0.42 V');
  });

  it('spans NML from VOL to VIL on the input axis', () => {
    const [span] = mark(chart.marks, 'nml').lines;
    expect(Math.abs((span?.[0] as number) - x(0.04))).toBeLessThan(0.0051 * plot.width);
    expect(span?.[2]).toBeCloseTo(x(0.4625), 1);
  });

  it('says it all in words for screen readers', () => {
    expect(chart.summary).toMatch(/Y: VM 0.50 V, VIL 0.46 V, VIH 0.54 V, VOL 0.04 V, VOH 0.96 V/);
    expect(chart.summary).toMatch(/at the unity-gain points/);
  });
});

describe('the convention', () => {
  it('moves VOL and VOH to the rails, and the margins with them, without solving again', () => {
    const rails = transferChart(report, 'Y', 'rails', SIZE);
    expect(mark(rails.marks, 'vol').text).toBe('VOL 0.00 V');
    expect(mark(rails.marks, 'voh').text).toBe('VOH 1.00 V');
    expect(mark(rails.marks, 'nml').text).toBe('NML 0.46 V');
    expect(mark(rails.marks, 'vm').text).toBe('VM 0.50 V');
    expect(rails.summary).toMatch(/at the rails/);
  });

  it('gives the figures the core gives when asked for that convention', () => {
    const asked = transferCurves(cmosInverter(1, 1, 0.5), WH, {
      input: 'A',
      points: 101,
      convention: 'rails',
    });
    const switched = inConvention(report.curves['Y']!, 'rails');
    for (const k of ['vm', 'vil', 'vih', 'vol', 'voh', 'nml', 'nmh'] as const)
      expect(switched[k]).toBeCloseTo(asked.curves['Y']![k] as number, 9);
  });
});

describe('several outputs and missing points', () => {
  const twoOut: TransferReport = {
    ...report,
    curves: {
      Y: report.curves['Y']!,
      Z: {
        ...report.curves['Y']!,
        points: report.curves['Y']!.points.map(([v, o], k) => [v, k === 50 ? null : o]),
      },
    },
  };

  it('tells outputs apart by dash and label, not colour alone', () => {
    const chart = transferChart(twoOut, 'Z', 'unity-gain', SIZE);
    expect(chart.curves.map((c) => c.legend.text)).toEqual(['Y', 'Z']);
    expect(chart.curves[0]?.legend.x).not.toBe(chart.curves[1]?.legend.x);
    expect(new Set(chart.curves.map((c) => c.dash)).size).toBe(2);
    expect(chart.curves.map((c) => c.chosen)).toEqual([false, true]);
  });

  it('breaks the stroke where an output has no voltage', () => {
    const z = transferChart(twoOut, 'Z', 'unity-gain', SIZE).curves[1];
    expect(z?.path.match(/M/g)).toHaveLength(2);
  });

  it('an output that does not switch is drawn without figures', () => {
    const stuck = circuit('tie')
      .rails()
      .input('A')
      .output('Y')
      .nmos('N1', { g: 'A', d: 'X', s: 'GND' })
      .pmos('P1', { g: 'GND', d: 'Y', s: 'VDD' })
      .build();
    const chart = transferChart(transferCurves(stuck, WH, { input: 'A' }), 'Y', 'unity-gain', SIZE);
    expect(chart.curves).toHaveLength(1);
    expect(chart.marks).toEqual([]);
  });
});
