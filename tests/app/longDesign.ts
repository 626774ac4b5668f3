/** A design long enough to be stored packed: 400 inverter stages, placed as an import would be. */
import type { CellDesign } from '../../src/core/document/design.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { autoPlace } from '../../src/core/sheet/autoPlace.ts';
import { inverterChain } from '../../bench/generators/index.ts';

export function longDesign(): CellDesign {
  const netlist = inverterChain(400);
  return {
    name: 'chain',
    technology: DEFAULT_TECHNOLOGY,
    netlist,
    expectations: {},
    sequences: [],
    sheet: autoPlace(netlist),
  };
}
