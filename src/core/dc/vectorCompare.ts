/**
 * One vector's level-1 answer beside the switch-level estimate it starts from, output by output
 * (docs/semantics.md §2, "DC levels", 6): what the app's Vector view shows. The vector is the last
 * of a list of steps solved in order, so a sequence step keeps the charge the steps before it left;
 * a list of one is solved from an unknown state, as the check of every vector does.
 */
import { sequencePass } from '../analysis/pass.ts';
import { compile, type CompiledNetlist } from '../compile/compile.ts';
import type { InputVector } from '../model/design.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import { levelName } from '../solver/levels.ts';
import { Simulator, type SolveResult } from '../solver/simulator.ts';
import { VectorDcRunner, type VectorDc } from './vectorDc.ts';

export interface OutputComparison {
  readonly name: string;
  /** The switch-level level and voltage estimate (null when no voltage is known). */
  readonly level: '0' | '1' | 'X' | 'Z';
  readonly switchVolts: number | null;
  /** The level-1 DC voltage; null where none could be decided (the notes say why). */
  readonly dcVolts: number | null;
  /** More than the reporting threshold apart (`DISAGREE_FRACTION_OF_VDD`). */
  readonly differs: boolean;
}

export interface DcComparison {
  /** Every input's value at the vector compared. */
  readonly inputs: InputVector;
  readonly outputs: readonly OutputComparison[];
  /** Amperes from the supplies: the switch-level estimate and the level-1 answer. */
  readonly switchCurrent: number;
  readonly dcCurrent: number | null;
  readonly currentDiffers: boolean;
  readonly notes: readonly string[];
}

/** The comparison at the last of `steps` (each lists what it changes, as sequences do). */
export function compareAtLastStep(
  netlist: Netlist,
  tech: Technology,
  steps: readonly InputVector[],
): DcComparison {
  const compiled = compile(netlist, tech);
  const runner = new VectorDcRunner(compiled);
  const found: DcComparison[] = [];
  const last = {
    add: (result: SolveResult, index: number): void => {
      if (index === steps.length - 1) found.push(compared(compiled, result, runner.vector(result)));
    },
  };
  sequencePass(new Simulator(compiled), steps, [last]);
  const [comparison] = found;
  if (comparison === undefined) throw new Error('no vector to compare');
  return comparison;
}

function compared(c: CompiledNetlist, result: SolveResult, dc: VectorDc): DcComparison {
  const known = (v: number): number | null => (Number.isFinite(v) ? v : null);
  const outputs = c.netlist.outputs.map((name) => {
    const n = c.netIndex.get(name) as number;
    return {
      name,
      level: levelName(result.levels[n] as number),
      switchVolts: known(result.volts[n] as number),
      dcVolts: dc.voltages[name] ?? null,
      differs: dc.differs.includes(name),
    };
  });
  return {
    inputs: result.inputs,
    outputs,
    switchCurrent: result.supplyCurrent,
    dcCurrent: dc.supplyCurrent,
    currentDiffers: dc.differs.includes('supplyCurrent'),
    notes: dc.notes,
  };
}
