/**
 * Checks a design file's schema cannot express: how its lists relate to each other. Each problem
 * carries the path of the field inside the cell (`netlist.inputs[0]`); the reader puts the cell in
 * front and spells the path as the file's own version does, so a hand-edited file is easy to fix.
 * Only what would make the design meaningless is refused; what the checker reports as a finding
 * (a pin connected to nothing, a duplicate device name) is left to it.
 */
import type { Netlist } from '../model/netlist.ts';
import type { SheetPart } from '../sheet/parts/index.ts';
import { modelCard, type Technology } from '../model/technology.ts';

export interface DesignProblem {
  /** Path of the offending field inside the cell. */
  readonly path: readonly (string | number)[];
  readonly message: string;
}

/** The first problem of the netlist's pin and rail lists, or null. */
export function netlistProblem(netlist: Netlist): DesignProblem | null {
  const rails = new Set<string>();
  for (const [i, rail] of netlist.rails.entries()) {
    if (rails.has(rail.net)) {
      return { path: ['netlist', 'rails', i, 'net'], message: `rail ${rail.net} is listed twice` };
    }
    rails.add(rail.net);
  }
  for (const list of ['inputs', 'outputs'] as const) {
    const seen = new Set<string>();
    for (const [i, net] of netlist[list].entries()) {
      if (seen.has(net)) return { path: ['netlist', list, i], message: `${net} is listed twice` };
      seen.add(net);
      if (list === 'inputs' && rails.has(net)) {
        return { path: ['netlist', 'inputs', i], message: `input ${net} is also a rail` };
      }
    }
  }
  return null;
}

/** Every transistor, drawn or in the netlist, that names a model card the technology lacks. */
export function modelProblems(
  tech: Technology,
  netlist: Netlist,
  parts: readonly SheetPart[] = [],
): DesignProblem[] {
  const problems: DesignProblem[] = [];
  const check = (kind: string, model: string | undefined, path: (string | number)[]): void => {
    const message = modelProblem(tech, kind, model);
    if (message !== null) problems.push({ path, message });
  };
  netlist.devices.forEach((d, i) => {
    if (d.kind === 'nmos' || d.kind === 'pmos') check(d.kind, d.model, ['netlist', 'devices', i, 'model']);
  });
  parts.forEach((p, i) => {
    if (p.kind === 'nmos' || p.kind === 'pmos') check(p.kind, p.model, ['sheet', 'parts', i, 'model']);
  });
  return problems;
}

/** Why a transistor cannot take the model card it names, or null. */
function modelProblem(tech: Technology, kind: string, model: string | undefined): string | null {
  if (model === undefined) return null;
  const card = modelCard(tech, model);
  if (card === undefined) return `no model card '${model}' in technology.models`;
  return card.type === kind ? null : `model '${model}' is a ${card.type} card, not ${kind}`;
}
