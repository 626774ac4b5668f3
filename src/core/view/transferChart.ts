/**
 * The geometry of the transfer-curve chart, as plain numbers and SVG path text: axes from 0 to VDD
 * with round ticks, the line Vout = Vin, one path per output (told apart by dash and a label, never
 * by colour alone), and for the chosen output its figures marked and labelled: VM where the curve
 * meets Vout = Vin, VIL and VIH where its slope is −1 (or +1), VOL and VOH as levels, and the noise
 * margins as spans of the input axis (NML from VOL to VIL, NMH from VIH to VOH). The panel only
 * draws what this returns; tests read it without a browser.
 */
import { inConvention, type CurveFigures, type MarginConvention } from '../dc/figures.ts';
import type { TransferCurve, TransferReport } from '../dc/transfer.ts';
import { formatVolts } from './format.ts';

export interface ChartSize {
  readonly width: number;
  readonly height: number;
}

export const DEFAULT_CHART_SIZE: ChartSize = { width: 360, height: 350 };

/**
 * Room around the plot, pixels: tick labels on the left; the legend above; VOL and VOH labels on the
 * right; below, the tick labels, the two noise-margin spans and the axis title.
 */
const PAD = { left: 40, right: 64, top: 26, bottom: 68 };
/** Rows below the input axis, pixels from its line. */
const BELOW = { ticks: 12, nml: 28, nmh: 44 };

/** Dash patterns for the curves in output order (solid first). */
export const CURVE_DASHES: readonly string[] = ['', '7 3', '2 3', '9 3 2 3'];

export interface ChartText {
  readonly x: number;
  readonly y: number;
  readonly text: string;
}

export interface Tick {
  readonly value: number;
  /** Pixel position along its axis. */
  readonly at: number;
  readonly label: string;
}

export interface ChartCurve {
  readonly output: string;
  /** SVG path data; a gap where the output has no voltage. */
  readonly path: string;
  readonly dash: string;
  readonly chosen: boolean;
  /** Its legend entry above the plot: a sample of its stroke, then its name. */
  readonly legend: {
    readonly sample: readonly [number, number, number, number];
    readonly x: number;
    readonly y: number;
    readonly text: string;
  };
}

export type FigureName = 'vm' | 'vil' | 'vih' | 'vol' | 'voh' | 'nml' | 'nmh';

/** A figure drawn on the chart: a point with guide lines, a level across the plot, or a span. */
export interface ChartMark {
  readonly figure: FigureName;
  /** The label: the figure's name and value. */
  readonly text: string;
  /** Guide segments, pixels [x1, y1, x2, y2]. */
  readonly lines: readonly (readonly [number, number, number, number])[];
  /** A point on the curve, pixels, when the figure has one. */
  readonly point: { readonly x: number; readonly y: number } | null;
  readonly labelAt: { readonly x: number; readonly y: number; readonly anchor: 'start' | 'middle' | 'end' };
}

export interface TransferChart {
  readonly size: ChartSize;
  readonly plot: { readonly x: number; readonly y: number; readonly width: number; readonly height: number };
  readonly vdd: number;
  readonly xTicks: readonly Tick[];
  readonly yTicks: readonly Tick[];
  /** Baseline of the input axis's tick labels, pixels. */
  readonly xTickBaseline: number;
  readonly xTitle: ChartText;
  readonly yTitle: ChartText;
  /** Vout = Vin, pixels [x1, y1, x2, y2]. */
  readonly diagonal: readonly [number, number, number, number];
  readonly curves: readonly ChartCurve[];
  readonly marks: readonly ChartMark[];
  /** The chart in words, for screen readers. */
  readonly summary: string;
}

/** Volts to pixels, both axes from 0 to VDD. */
interface Scale {
  readonly x: (volts: number) => number;
  readonly y: (volts: number) => number;
}

/** The chart of a report, with `output`'s figures in `convention` marked. */
export function transferChart(
  report: TransferReport,
  output: string | null,
  convention: MarginConvention,
  size: ChartSize = DEFAULT_CHART_SIZE,
): TransferChart {
  const outputs = Object.keys(report.curves);
  const vdd = sweepEnd(report);
  const plot = {
    x: PAD.left,
    y: PAD.top,
    width: size.width - PAD.left - PAD.right,
    height: size.height - PAD.top - PAD.bottom,
  };
  const scale: Scale = {
    x: (v) => round(plot.x + (v / vdd) * plot.width),
    y: (v) => round(plot.y + plot.height - (v / vdd) * plot.height),
  };
  const ticks = niceTicks(vdd);
  const chosen = output !== null && report.curves[output] !== undefined ? output : (outputs[0] ?? null);
  const curve = chosen === null ? undefined : report.curves[chosen];
  const figures = curve === undefined ? null : inConvention(curve, convention);
  return {
    size,
    plot,
    vdd,
    xTicks: ticks.map((t) => ({ ...t, at: scale.x(t.value) })),
    yTicks: ticks.map((t) => ({ ...t, at: scale.y(t.value) })),
    xTickBaseline: plot.y + plot.height + BELOW.ticks,
    xTitle: { x: plot.x + plot.width / 2, y: size.height - 4, text: `V(${report.input}) [V]` },
    yTitle: { x: 4, y: plot.y - 8, text: 'Vout [V]' },
    diagonal: [scale.x(0), scale.y(0), scale.x(vdd), scale.y(vdd)],
    curves: outputs.map((o, i) =>
      chartCurve(o, report.curves[o] as TransferCurve, i, o === chosen, scale, legendAt(plot, i)),
    ),
    marks: curve === undefined || figures === null ? [] : figureMarks(curve, figures, scale, plot),
    summary: summary(report, chosen, figures, convention),
  };
}

/** The swept input's last voltage: the sweep runs from 0 to VDD. */
function sweepEnd(report: TransferReport): number {
  const [first] = Object.values(report.curves);
  const last = first?.points[first.points.length - 1]?.[0];
  return last !== undefined && last > 0 ? last : 1;
}

function round(px: number): number {
  return Math.round(px * 100) / 100;
}

/** Ticks at 1, 2 or 5 × 10^k volts, at most seven from 0 to VDD. */
export function niceTicks(vdd: number): { value: number; label: string }[] {
  const raw = vdd / 6;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = ([1, 2, 5, 10].find((m) => m * power >= raw) ?? 10) * power;
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const ticks: { value: number; label: string }[] = [];
  for (let k = 0; k * step <= vdd * (1 + 1e-9); k++) {
    const value = Number((k * step).toFixed(decimals + 1));
    ticks.push({ value, label: value.toFixed(decimals) });
  }
  return ticks;
}

/** Legend entries run right to left from the plot's top right corner, 56 px each. */
function legendAt(plot: Plot, index: number): { x: number; y: number } {
  return { x: plot.x + plot.width - 56 * (index + 1), y: plot.y - 8 };
}

function chartCurve(
  output: string,
  curve: TransferCurve,
  index: number,
  chosen: boolean,
  scale: Scale,
  at: { x: number; y: number },
): ChartCurve {
  let path = '';
  let pen = false;
  for (const [vin, vout] of curve.points) {
    if (vout === null) {
      pen = false;
      continue;
    }
    path += `${pen ? 'L' : 'M'}${scale.x(vin)} ${scale.y(vout)} `;
    pen = true;
  }
  return {
    output,
    path: path.trim(),
    dash: CURVE_DASHES[index % CURVE_DASHES.length] as string,
    chosen,
    legend: { sample: [at.x, at.y, at.x + 18, at.y], x: at.x + 22, y: at.y + 3, text: output },
  };
}

type Plot = TransferChart['plot'];

function figureMarks(curve: TransferCurve, f: CurveFigures, scale: Scale, plot: Plot): ChartMark[] {
  const marks: ChartMark[] = [];
  const bottom = plot.y + plot.height;
  const right = plot.x + plot.width;
  if (f.vm !== null) {
    const [x, y] = [scale.x(f.vm), scale.y(f.vm)];
    marks.push({
      figure: 'vm',
      text: `VM ${formatVolts(f.vm)}`,
      lines: [],
      point: { x, y },
      labelAt: { x: x + 6, y: y - 6, anchor: 'start' },
    });
  }
  marks.push(...unityMarks(curve, f, scale, bottom));
  for (const [figure, level] of [
    ['vol', f.vol],
    ['voh', f.voh],
  ] as const) {
    if (level === null) continue;
    const y = scale.y(level);
    marks.push({
      figure,
      text: `${figure.toUpperCase()} ${formatVolts(level)}`,
      lines: [[plot.x, y, right, y]],
      point: null,
      labelAt: { x: right + 3, y: y + 3, anchor: 'start' },
    });
  }
  marks.push(...marginSpans(f, scale, bottom));
  return marks;
}

/** VIL and VIH: a point on the curve where |slope| = 1, with a guide down to the input axis. */
function unityMarks(curve: TransferCurve, f: CurveFigures, scale: Scale, bottom: number): ChartMark[] {
  const unity = curve.levels['unity-gain'];
  const falling = curve.inverting !== false;
  const outAtVil = falling ? unity.voh : unity.vol;
  const outAtVih = falling ? unity.vol : unity.voh;
  const marks: ChartMark[] = [];
  for (const [figure, vin, vout] of [
    ['vil', f.vil, outAtVil],
    ['vih', f.vih, outAtVih],
  ] as const) {
    if (vin === null) continue;
    const x = scale.x(vin);
    const y = vout === null ? null : scale.y(vout);
    marks.push({
      figure,
      text: `${figure.toUpperCase()} ${formatVolts(vin)}`,
      lines: y === null ? [] : [[x, y, x, bottom]],
      point: y === null ? null : { x, y },
      labelAt: { x, y: (y ?? bottom) - 8, anchor: figure === 'vil' ? 'end' : 'start' },
    });
  }
  return marks;
}

/** NML spans VOL…VIL and NMH spans VIH…VOH of the input axis, drawn in rows below it. */
function marginSpans(f: CurveFigures, scale: Scale, bottom: number): ChartMark[] {
  const marks: ChartMark[] = [];
  for (const [figure, from, to, value] of [
    ['nml', f.vol, f.vil, f.nml],
    ['nmh', f.vih, f.voh, f.nmh],
  ] as const) {
    if (from === null || to === null || value === null) continue;
    const [x1, x2] = [scale.x(Math.min(from, to)), scale.x(Math.max(from, to))];
    const y = bottom + BELOW[figure];
    marks.push({
      figure,
      text: `${figure.toUpperCase()} ${formatVolts(value)}`,
      lines: [
        [x1, y, x2, y],
        [x1, y - 3, x1, y + 3],
        [x2, y - 3, x2, y + 3],
      ],
      point: null,
      labelAt: { x: (x1 + x2) / 2, y: y - 4, anchor: 'middle' },
    });
  }
  return marks;
}

function summary(
  report: TransferReport,
  output: string | null,
  f: CurveFigures | null,
  convention: MarginConvention,
): string {
  const held = Object.entries(report.hold).map(([k, v]) => `${k}=${v}`);
  const head = `Transfer curve of ${Object.keys(report.curves).join(', ') || 'no output'} as ${report.input} sweeps${held.length > 0 ? ` with ${held.join(' ')}` : ''}`;
  if (output === null || f === null) return `${head}.`;
  const named: [string, number | null][] = [
    ['VM', f.vm],
    ['VIL', f.vil],
    ['VIH', f.vih],
    ['VOL', f.vol],
    ['VOH', f.voh],
    ['NML', f.nml],
    ['NMH', f.nmh],
  ];
  const figures = named.filter(([, v]) => v !== null).map(([k, v]) => `${k} ${formatVolts(v)}`);
  return `${head}. ${output}: ${figures.join(', ') || 'no figures'} (levels ${convention === 'rails' ? 'at the rails' : 'at the unity-gain points'}).`;
}
