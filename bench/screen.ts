// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * What a toggle costs on screen, not only in the solver: the sheet is placed once (as the app does
 * for an imported netlist), then each toggle re-solves and works out what the overlay paints. Two
 * rows: the app's way (the previous paint updated where the vector changed it, and the areas to
 * draw again) and, for comparison, the whole paint read by name and filed by look as it once was.
 * React and Konva drawing come on top and are not measured here. Measured on CPU time, in batches
 * of one walk, since one toggle is below the CPU clock's useful resolution.
 */
import type { InputVector } from '../src/core/model/design.ts';
import type { Netlist } from '../src/core/model/netlist.ts';
import type { SolveResult } from '../src/core/solver/simulator.ts';
import { autoPlace } from '../src/core/sheet/autoPlace.ts';
import { sheetToNetlist } from '../src/core/sheet/toNetlist.ts';
import {
  overlayPaint,
  paintedDevices,
  paintedMarks,
  paintLayout,
  strokesByLook,
  type PaintLayout,
} from '../src/core/view/overlayPaint.ts';
import { changedAreas } from '../src/core/view/paintAreas.ts';
import { bindPaint, paintSolved, repaintSolved } from '../src/core/view/paintSolved.ts';
import { solvedView } from '../src/core/view/solvedView.ts';
import { prepare, timed, type CaseResult, type Prepared } from './measure.ts';
import { cpuSeconds, type Sample } from './timing.ts';

/** Runs `batch` (which does `count` toggles) until `budget` CPU seconds are spent; per-toggle CPU. */
function cpuPerToggle(batch: () => void, count: number, budget = 0.5): Sample {
  for (let i = 0; i < 3; i++) batch();
  const times: number[] = [];
  let total = 0;
  while (times.length < 5 || total < budget) {
    const start = cpuSeconds();
    batch();
    const t = cpuSeconds() - start;
    times.push(t / count);
    total += t;
  }
  times.sort((x, y) => x - y);
  return { runs: times.length * count, median: times[times.length >> 1]!, best: times[0]!, total };
}

interface Placed {
  readonly p: Prepared;
  readonly layout: PaintLayout;
}

function placed(netlist: Netlist): Placed {
  const sheet = autoPlace(netlist);
  const derived = sheetToNetlist(sheet, netlist.name);
  return { p: prepare(derived.netlist), layout: paintLayout(sheet, derived) };
}

/** Walks the toggles in batches: `paint` gets each new result and returns how much it drew. */
function walked(
  name: string,
  { p }: Placed,
  walk: readonly InputVector[],
  paint: (result: SolveResult) => number,
): CaseResult {
  let previous = p.simulator.solveFresh(walk[0]!);
  let painted = paint(previous);
  let i = 1;
  const batch = (): void => {
    for (let k = 0; k < walk.length; k++) {
      previous = p.simulator.solveNext(walk[i++ % walk.length]!, previous);
      painted += paint(previous);
    }
  };
  const sample = cpuPerToggle(batch, walk.length);
  if (painted === 0) throw new Error(`${name}: nothing was painted`);
  return timed(name, 'toggle', p, 1, sample);
}

/** Solve, then the previous paint updated where the vector changed it, and the areas to redraw. */
export function measureToggleWithPaint(
  name: string,
  netlist: Netlist,
  walk: readonly InputVector[],
): CaseResult {
  const sheet = placed(netlist);
  const binding = bindPaint(sheet.layout, sheet.p.compiled);
  let paint: ReturnType<typeof paintSolved> | null = null;
  return walked(name, sheet, walk, (result) => {
    if (paint === null) return (paint = paintSolved(binding, result)).nets.length;
    const step = repaintSolved(binding, paint, result);
    paint = step.paint;
    return changedAreas(sheet.layout, step).length + 1;
  });
}

/** Solve, then the whole paint read by name and every segment, mark and device listed by look. */
export function measureToggleWithFullPaint(
  name: string,
  netlist: Netlist,
  walk: readonly InputVector[],
): CaseResult {
  const sheet = placed(netlist);
  return walked(name, sheet, walk, (result) => {
    const view = solvedView(sheet.p.compiled, result);
    const paint = overlayPaint(sheet.layout, view.net, view.device);
    const { layout } = sheet;
    return (
      strokesByLook(layout, paint).size +
      paintedMarks(layout, paint).length +
      paintedDevices(layout, paint).length
    );
  });
}
