/**
 * The nodal solve with extreme but finite values (docs/semantics.md §2): a group whose conductances
 * span more than double precision can resolve is reported as ill-conditioned, never an exception.
 */
import { describe, expect, it } from 'vitest';
import { checkSweep } from '../../src/core/analysis/check.ts';
import { circuit } from '../../src/core/model/builder.ts';
import { DEFAULT_TECHNOLOGY as TECH } from '../../src/core/model/technology.ts';
import { FLAG_ILL_CONDITIONED } from '../../src/core/solver/levels.ts';
import { solve } from '../helpers.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';

/** VDD → P (always on) → Y → N1 → m → N2 → GND, all on: two unknowns, so a matrix solve. */
function stack(n1Width: number) {
  return circuit('stack')
    .rails()
    .output('Y')
    .pmos('P', { g: 'GND', d: 'Y', s: 'VDD', w: 1 })
    .nmos('N1', { g: 'VDD', d: 'Y', s: 'm', w: n1Width })
    .nmos('N2', { g: 'VDD', d: 'm', s: 'GND', w: 1 })
    .build();
}

describe('ill-conditioned nodal solves', () => {
  it('a width of 1e300 makes the group X with a limit finding, and the output an unknown error', () => {
    const s = solve(stack(1e300), {});
    expect(s.level('Y')).toBe('X');
    expect(s.flags('Y') & FLAG_ILL_CONDITIONED).toBe(FLAG_ILL_CONDITIONED);
    const report = checkSweep(stack(1e300));
    const kinds = report.findings.map((f) => `${f.kind}:${f.severity}`);
    expect(kinds).toContain('limit:warning');
    expect(kinds).toContain('unknown:error');
    expect(report.findings.find((f) => f.kind === 'limit')?.nets).toEqual(['Y', 'm']);
  });

  it('a width of 1e18 (what m=1e18 would make; the importer refuses it, a design may still hold it)', () => {
    const report = checkSweep(stack(1e18));
    expect(reportRows(report)[0]!.outputs.Y).toBe('X');
    expect(report.summary.limit).toBe(1);
    expect(report.summary.unknown).toBe(1);
  });

  it('a spread double precision can carry is solved: the divider rule', () => {
    // Rp = 31 kΩ·0.25, Rn1 = 13 kΩ·0.25/1e6, Rn2 = 13 kΩ·0.25 (the default process); Y divides VDD
    // between Rp above and Rn1 + Rn2 below (Ohm's law).
    const rp = TECH.rp * 0.25;
    const below = TECH.rn * 0.25 * (1 + 1e-6);
    expect(solve(stack(1e6), {}).volts('Y')).toBeCloseTo((TECH.vdd * below) / (rp + below), 9);
  });

  it('one unknown is a plain division whatever the spread', () => {
    const pair = circuit('pair')
      .rails()
      .output('Y')
      .pmos('P', { g: 'GND', d: 'Y', s: 'VDD', w: 1 })
      .nmos('N', { g: 'VDD', d: 'Y', s: 'GND', w: 1e300 })
      .build();
    expect(solve(pair, {}).level('Y')).toBe('0');
  });
});
