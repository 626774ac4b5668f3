/**
 * The limiting transistor named in a degraded finding follows a rule that does not depend on the order
 * devices are listed in (docs/semantics.md §2): among the paths that reach a net's best level, the
 * device that made the last threshold drop, the smallest name where paths disagree. Our own rule: no
 * published source applies.
 */
import { describe, expect, it } from 'vitest';
import { checkSweep } from '../../src/core/analysis/check.ts';
import { circuit } from '../../src/core/model/builder.ts';
import type { Device, Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY as TECH } from '../../src/core/model/technology.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';

function permutations<T>(items: readonly T[]): T[][] {
  if (items.length <= 1) return [[...items]];
  return items.flatMap((x, i) =>
    permutations([...items.slice(0, i), ...items.slice(i + 1)]).map((rest) => [x, ...rest]),
  );
}

function degradedAt(netlist: Netlist, devices: readonly Device[]): string[] {
  const report = checkSweep({ ...netlist, devices }, { allNets: true });
  return report.findings
    .filter((f) => f.kind === 'degraded' && f.vector === 0)
    .map((f) => `${f.nets.join()}:${f.devices.join()}`);
}

describe('the limiter of a degraded level', () => {
  // Y is reached from input A (at 0) through P1, which floors the low at |Vtp|, and from ground through
  // R1 and R2, which pass it whole: Y's best low is 0 V, not degraded. n1 hangs off Y through P2 (gate
  // at ground), which floors it at |Vtp|: P2 limits n1, whichever path to Y the search meets first. A
  // search that kept the limiter of a path it had since improved on named P1 in some orders.
  const cell = circuit('late-better-path')
    .rails()
    .input('A')
    .output('n1')
    .pmos('P1', { g: 'GND', d: 'Y', s: 'A' })
    .resistor('R1', 'GND', 'm', 1e3)
    .resistor('R2', 'm', 'Y', 1e3)
    .pmos('P2', { g: 'GND', d: 'n1', s: 'Y' })
    .capacitor('C1', 'n1', 'GND', 1e-15)
    .build();

  it('is P2 for n1 at A = 0 in all 120 orders of the five devices', () => {
    const seen = new Set(permutations(cell.devices).map((order) => degradedAt(cell, order).join(' ')));
    expect([...seen]).toEqual(['n1:P2']);
  });

  // A low passed by a PMOS with its gate at 0 is floored at |Vtp| (W&H 4th ed. ch. 1, pass transistors;
  // common practice).
  it('n1 sits at |Vtp|', () => {
    const report = checkSweep(cell, { allNets: true });
    expect(reportRows(report)[0]!.voltages.n1).toBeCloseTo(TECH.vtp, 12);
    expect(reportRows(report)[0]!.voltages.Y).toBe(0);
  });
});
