import type { GroupStatus } from './group.ts';
import type { OperatingPoint } from './operatingPoint.ts';

/**
 * A group of nets left without a DC voltage, and why; or (`held`) floating nets given the voltage
 * their stored charge holds, an assumption the rest of the answer rests on.
 */
export interface DcProblem {
  readonly kind: GroupStatus | 'floating' | 'held';
  readonly nets: readonly string[];
  readonly message: string;
}

/** Why an operating point has no voltage on some nets, one entry per problem group. */
export function problems(point: OperatingPoint): DcProblem[] {
  const names = point.network.compiled.netNames;
  const named = (nets: ArrayLike<number>): string[] => Array.from(nets, (n) => names[n] as string);
  const out: DcProblem[] = [];
  point.network.groups.forEach((group, k) => {
    const outcome = point.groups[k];
    if (outcome === undefined) return;
    const nets = named(group.nets);
    const shown = nets.slice(0, 6).join(', ') + (nets.length > 6 ? ', …' : '');
    switch (outcome.status) {
      case 'solved': {
        const unknown = named(outcome.floating.filter((n) => Number.isNaN(point.volts[n])));
        for (const n of outcome.held)
          out.push({
            kind: 'held',
            nets: [names[n] as string],
            message: `${names[n]}: floating, held at its stored ${point.volts[n]?.toFixed(3)} V`,
          });
        if (unknown.length > 0)
          out.push({
            kind: 'floating',
            nets: unknown,
            message: `${unknown.join(', ')}: floating (no conducting path to a fixed voltage), charge unknown`,
          });
        break;
      }
      case 'blocked':
        out.push({
          kind: 'blocked',
          nets,
          message: `${shown}: no voltage, because ${named(outcome.nets).join(', ')} has none`,
        });
        break;
      case 'not-converged':
        out.push({
          kind: 'not-converged',
          nets,
          message: `${shown}: did not converge (still moving: ${named(outcome.nets).join(', ')}; tried ${outcome.tried.join(', then ')})`,
        });
        break;
      case 'unstable':
        out.push({
          kind: 'unstable',
          nets,
          message: `${shown}: only an unstable balance of a loop was found (a bistable latch between its states); its state depends on history, so run a sequence`,
        });
        break;
    }
  });
  return out;
}

/** Why `net` has no voltage at this point. */
export function whyUnknown(point: OperatingPoint, net: string): string {
  return (
    problems(point).find((p) => p.kind !== 'held' && p.nets.includes(net))?.message ?? `${net}: no DC voltage`
  );
}
