/**
 * Self-gated (diode-connected) transistors, docs/semantics.md §2: a device whose gate is tied to one of
 * its own channel nets clamps that net one threshold from its other end.
 */
import { describe, expect, it } from 'vitest';
import { checkSweep } from '../../src/core/analysis/check.ts';
import { compile, type CompiledNetlist } from '../../src/core/compile/compile.ts';
import { circuit } from '../../src/core/model/builder.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY as TECH } from '../../src/core/model/technology.ts';
import { FLAG_DEGRADED, MAYBE, OFF, ON } from '../../src/core/solver/levels.ts';
import { Simulator } from '../../src/core/solver/simulator.ts';
import { leading, solve, solveSteps } from '../helpers.ts';
import { fixtureCell } from './fixtures.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';

/** Channel element of a device by name. */
function elementOf(c: CompiledNetlist, device: string): number {
  return c.chDevice.indexOf(c.netlist.devices.findIndex((d) => d.name === device));
}

/** Conduction code of a device by name in a fresh solve. */
function conduction(netlist: Netlist, device: string, inputs = {}): number {
  const c = compile(netlist, TECH);
  return new Simulator(c).solveFresh(inputs).conduction[elementOf(c, device)]!;
}

describe('tie cells', () => {
  // A diode-connected MOSFET is always in saturation (V_DS = V_GS); with no current drawn from its gate
  // net the Shichman–Hodges square law I = (k'/2)(W/L)(V_GS − V_T)² gives V_GS = V_T (e.g. Rabaey et
  // al., Digital Integrated Circuits, 2nd ed., ch. 3; equation number from memory). Tie cells rely on
  // it: the clamped net is one threshold from its rail and fully turns on the device it gates
  // (common practice, no source).
  it.each([
    // [fixture, output level and volts, clamped net, its volts, the clamp]
    ['tieh.sp', '1', TECH.vdd, 'A', TECH.vtn, 'MN'],
    ['tiel.sp', '0', 0, 'B', TECH.vdd - TECH.vtp, 'MP'],
  ] as const)(
    '%s: Z = %s; the clamped net sits one threshold from its rail, degraded',
    (file, z, zVolts, net, volts, clamp) => {
      const cell = fixtureCell(file);
      const report = checkSweep(cell.netlist, { expectations: cell.expectations, allNets: true });
      expect(report.summary.errors).toBe(0);
      const [v] = leading(reportRows(report), 1);
      expect(v.outputs.Z).toBe(z);
      expect(v.voltages.Z).toBe(zVolts);
      expect(v.voltages[net]).toBeCloseTo(volts, 12);
      const s = solve(cell.netlist, {});
      expect(s.level(net)).toBe(z === '1' ? '0' : '1');
      expect(s.flags(net) & FLAG_DEGRADED).toBe(FLAG_DEGRADED);
      expect(report.findings.map((f) => `${f.kind}:${f.nets.join()}:${f.devices.join()}`)).toEqual([
        `degraded:${net}:${clamp}`,
      ]);
      expect(conduction(cell.netlist, clamp)).toBe(ON);
    },
  );
});

describe('the clamp in both directions', () => {
  // An NMOS whose gate is its drain n passes a high from n to its source one Vtn down, like any NMOS
  // with its gate at the high level (the threshold drop: W&H 4th ed. ch. 1, pass transistors; common
  // practice).
  const dropper = circuit('dropper')
    .rails()
    .input('A')
    .output('Y')
    .pmos('P1', { g: 'A', d: 'n', s: 'VDD' })
    .nmos('N1', { g: 'A', d: 'n', s: 'GND' })
    .nmos('ND', { g: 'n', d: 'n', s: 'Y' })
    .capacitor('CY', 'Y', 'GND', 10e-15)
    .build();

  it('a high on the gate end reaches the other end one Vtn lower', () => {
    const s = solve(dropper, { A: '0' });
    expect(s.volts('Y')).toBeCloseTo(TECH.vdd - TECH.vtn, 12);
    expect(s.level('Y')).toBe('1');
  });

  it('a low on the gate end is blocked: the other end floats and keeps its charge', () => {
    const [, low] = leading(solveSteps(dropper, [{ A: '0' }, { A: '1' }]), 2);
    expect(low.level('n')).toBe('0');
    expect(low.level('Y')).toBe('Z');
    expect(low.volts('Y')).toBeCloseTo(TECH.vdd - TECH.vtn, 12);
    expect(low.result.conduction[elementOf(low.result.compiled, 'ND')]).toBe(OFF);
    // From an unknown state the other end's charge is unknown, so whether the clamp conducts is too.
    expect(conduction(dropper, 'ND', { A: '1' })).toBe(MAYBE);
  });

  it('reverse-biased (gate end pulled low, other end high) it carries no current', () => {
    const reverse = circuit('reverse')
      .rails()
      .output('n', 'm')
      .nmos('NL', { g: 'VDD', d: 'n', s: 'GND' })
      .pmos('PH', { g: 'GND', d: 'm', s: 'VDD' })
      .nmos('ND', { g: 'n', d: 'n', s: 'm' })
      .build();
    const report = checkSweep(reverse, { allNets: true });
    const [v] = leading(reportRows(report), 1);
    expect(v.outputs).toEqual({ n: '0', m: '1' });
    expect(v.supplyCurrent).toBe(0);
    expect(conduction(reverse, 'ND')).toBe(OFF);
  });

  it('forward-biased against a pull-up it is a ratioed load: the linear divider of the nodal rule', () => {
    // docs/semantics.md §2: a conducting clamp is its on-resistance in a nodal solve, then the level is
    // held at or above the clamp. Rp = 31 kΩ · 0.25/1, Rn = 13 kΩ · 0.25/1 (the default process).
    const fight = circuit('fight')
      .rails()
      .output('A')
      .pmos('PL', { g: 'GND', d: 'A', s: 'VDD' })
      .nmos('ND', { g: 'A', d: 'A', s: 'GND' })
      .build();
    const rp = (TECH.rp * 0.25) / 1;
    const rn = (TECH.rn * 0.25) / 1;
    const s = solve(fight, {});
    expect(s.volts('A')).toBeCloseTo((TECH.vdd * rn) / (rp + rn), 9);
    expect(s.result.supplyCurrent).toBeCloseTo(TECH.vdd / (rp + rn), 12);
    expect(checkSweep(fight).summary['static-current']).toBe(1);
  });
});
