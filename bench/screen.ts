// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * What a toggle costs on screen, not only in the solver: the sheet is placed once (as the app does
 * for an imported netlist), then each toggle re-solves and rebuilds the overlay's paint (the level of
 * every wire segment, every mark and device shape). React and Konva drawing come on top and are not
 * measured here.
 */
import type { InputVector } from '../src/core/model/design.ts';
import type { Netlist } from '../src/core/model/netlist.ts';
import { autoPlace } from '../src/core/sheet/autoPlace.ts';
import { sheetToNetlist } from '../src/core/sheet/toNetlist.ts';
import { overlayPaint, paintLayout } from '../src/core/view/overlayPaint.ts';
import { solvedView } from '../src/core/view/solvedView.ts';
import { prepare, timed, type CaseResult } from './measure.ts';
import { repeat } from './timing.ts';

export function measureToggleWithPaint(
  name: string,
  netlist: Netlist,
  walk: readonly InputVector[],
): CaseResult {
  const sheet = autoPlace(netlist);
  const derived = sheetToNetlist(sheet, netlist.name);
  const p = prepare(derived.netlist);
  const layout = paintLayout(sheet, derived);
  let previous = p.simulator.solveFresh(walk[0]!);
  let i = 1;
  let painted = 0;
  const sample = repeat(
    () => {
      previous = p.simulator.solveNext(walk[i++ % walk.length]!, previous);
      const view = solvedView(p.compiled, previous);
      painted += overlayPaint(layout, view.net, view.device).marks.length;
    },
    { warmup: 2 * walk.length, budgetSeconds: 0.5, maxRuns: 2000 },
  );
  if (painted === 0) throw new Error(`${name}: nothing was painted`);
  return timed(name, 'toggle', p, 1, sample);
}
