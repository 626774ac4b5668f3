import { describe, expect, it } from 'vitest';
import { checkSequence, checkSweep } from '../../src/core/analysis/check.ts';
import type { Finding, FindingKind } from '../../src/core/analysis/report.ts';
import { circuit } from '../../src/core/model/builder.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';

const kinds = (findings: readonly Finding[]): FindingKind[] => [...new Set(findings.map((f) => f.kind))];
const design = (id: string) => STARTERS.find((s) => s.id === id)!.design;
const inverter = circuit('inv')
  .rails()
  .input('A')
  .output('Y')
  .pmos('P1', { g: 'A', d: 'Y', s: 'VDD', w: 1 })
  .nmos('N1', { g: 'A', d: 'Y', s: 'GND', w: 0.5 });

describe('short', () => {
  it('an always-on PMOS and NMOS fighting over Y is a short with its chain', () => {
    const cell = circuit('bad')
      .rails()
      .output('Y')
      .pmos('P1', { g: 'GND', d: 'Y', s: 'VDD', w: 1 })
      .nmos('N1', { g: 'VDD', d: 'Y', s: 'GND', w: 0.5 })
      .build();
    const short = checkSweep(cell).findings.find((f) => f.kind === 'short');
    expect(short?.severity).toBe('error');
    expect(short?.path).toEqual(['VDD', 'P1', 'Y', 'N1', 'GND']);
    // Equal on-resistances (31 kΩ·0.25/1 = 7.75 kΩ, 13 kΩ·0.25/0.5 = 6.5 kΩ) → I = 2.5 / 14.25 kΩ.
    expect(short?.current).toBeCloseTo(2.5 / 14250, 12);
  });
  it('a ratioed NOR draws current by design: static current, never a short', () => {
    const report = checkSweep(design('ratioed-nor2').netlist);
    expect(report.summary.short).toBe(0);
    const vectors = new Set(report.findings.filter((f) => f.kind === 'static-current').map((f) => f.vector));
    expect([...vectors]).toEqual([1, 2, 3]);
  });
});

describe('static current', () => {
  // Resistor-load inverter: 20 kΩ against N1 at 13 kΩ·0.25/1 = 3.25 kΩ → 2.5 V / 23.25 kΩ = 107.5 µA
  // (RCN 0.25 µm on-resistance from memory; arithmetic derived).
  const report = checkSweep(design('resistor-load-inverter').netlist);
  it('flows with the output low, with amperes and watts', () => {
    const f = reportRows(report)[1]!.findings.find((x) => x.kind === 'static-current');
    expect(f?.path).toEqual(['VDD', 'RL', 'Y', 'N1', 'GND']);
    expect(f?.current).toBeCloseTo(2.5 / 23250, 12);
    expect(f?.watts).toBeCloseTo((2.5 * 2.5) / 23250, 12);
    expect(reportRows(report)[1]!.supplyCurrent).toBeCloseTo(2.5 / 23250, 12);
  });
  it('does not flow with the output high', () => {
    expect(reportRows(report)[0]!.findings).toEqual([]);
    expect(reportRows(report)[0]!.supplyCurrent).toBe(0);
  });
});

describe('floating', () => {
  const tristate = design('tristate-inverter');
  it('a disabled tristate output is an error when nothing says Z is intended', () => {
    const report = checkSweep(tristate.netlist);
    const f = report.findings.filter((x) => x.kind === 'floating');
    expect(f.map((x) => x.vector)).toEqual([0, 2]);
    expect(f.every((x) => x.severity === 'error' && x.nets[0] === 'Y')).toBe(true);
    // It names the devices that could drive Y, all off: the enable pair of the stack.
    expect(f[0]!.devices).toEqual(['NEN', 'PEN']);
  });
  it('is not reported where the expected value is Z', () => {
    expect(checkSweep(tristate.netlist, { expectations: tristate.expectations }).summary.floating).toBe(0);
  });
  it('is a warning on a dynamic node holding known charge', () => {
    const seq = design('precharged-and2').sequences[0]!;
    const f = checkSequence(design('precharged-and2').netlist, seq.steps).findings.find(
      (x) => x.kind === 'floating',
    );
    expect(f?.severity).toBe('warning');
    expect(f?.nets).toEqual(['X']);
  });
});

describe('contention', () => {
  it('two inverters driving Y to opposite levels', () => {
    const cell = circuit('fight')
      .rails()
      .input('A', 'B')
      .output('Y')
      .pmos('P1', { g: 'A', d: 'Y', s: 'VDD', w: 1 })
      .nmos('N1', { g: 'A', d: 'Y', s: 'GND', w: 0.5 })
      .pmos('P2', { g: 'B', d: 'Y', s: 'VDD', w: 1 })
      .nmos('N2', { g: 'B', d: 'Y', s: 'GND', w: 0.5 })
      .build();
    const report = checkSweep(cell);
    const vectorsWithContention = report.findings.filter((f) => f.kind === 'contention').map((f) => f.vector);
    expect(vectorsWithContention).toEqual([1, 2]);
    expect(reportRows(report)[1]!.outputs.Y).toBe('X');
  });
  it('a single inverter never contends', () => {
    expect(checkSweep(inverter.build()).summary.contention).toBe(0);
  });
});

describe('degraded', () => {
  const passThenInvert = (withPmos: boolean) => {
    let b = circuit('pass')
      .rails()
      .input('D', 'EN', 'ENb')
      .output('Y')
      .nmos('NP', { g: 'EN', d: 'D', s: 'm' })
      .pmos('P1', { g: 'm', d: 'Y', s: 'VDD', w: 1 })
      .nmos('N1', { g: 'm', d: 'Y', s: 'GND', w: 0.5 });
    if (withPmos) b = b.pmos('PP', { g: 'ENb', d: 'D', s: 'm' });
    return b.build();
  };
  it('an NMOS-only pass of a 1 into a gate is flagged, naming the pass device', () => {
    const report = checkSweep(passThenInvert(false));
    const f = report.findings.filter((x) => x.kind === 'degraded');
    expect(f.length).toBeGreaterThan(0);
    expect(f[0]!.nets).toEqual(['m']);
    expect(f[0]!.devices).toEqual(['NP']);
  });
  it('a transmission gate is not flagged', () => {
    const report = checkSequence(passThenInvert(true), [{ D: '1', EN: '1', ENb: '0' }]);
    expect(report.summary.degraded).toBe(0);
  });
});

describe('charge sharing', () => {
  const and2 = design('precharged-and2');
  it('evaluating with B = 0 shares the precharged node with the stack', () => {
    const report = checkSequence(and2.netlist, and2.sequences[0]!.steps);
    const f = report.findings.find((x) => x.kind === 'charge-sharing');
    expect(f?.vector).toBe(2);
    expect(f?.nets).toEqual(['X', 'm1']);
  });
  it('evaluating with A = B = 1 discharges instead: no sharing', () => {
    const report = checkSequence(and2.netlist, [
      { CLK: '0', A: '0', B: '0' },
      { CLK: '1', A: '1', B: '1' },
    ]);
    expect(report.summary['charge-sharing']).toBe(0);
    expect(report.steps![1]!.outputs.Y).toBe('1');
  });
});

describe('no steady state', () => {
  it('releasing set and reset of a NAND latch together is a race', () => {
    const report = checkSequence(design('nand-latch').netlist, [
      { Sb: '0', Rb: '0' },
      { Sb: '1', Rb: '1' },
    ]);
    const f = report.findings.find((x) => x.kind === 'no-steady-state');
    expect(f?.severity).toBe('error');
    expect(f?.vector).toBe(1);
    expect(report.steps![1]!.outputs).toEqual({ Q: 'X', Qb: 'X' });
  });
  it('an enabled ring of three stages oscillates', () => {
    const ring = circuit('ring')
      .rails()
      .input('EN')
      .output('a')
      .pmos('PE', { g: 'EN', d: 'a', s: 'VDD' })
      .pmos('PC', { g: 'c', d: 'a', s: 'VDD' })
      .nmos('NE', { g: 'EN', d: 'a', s: 'x' })
      .nmos('NC', { g: 'c', d: 'x', s: 'GND' })
      .pmos('P1', { g: 'a', d: 'b', s: 'VDD' })
      .nmos('N1', { g: 'a', d: 'b', s: 'GND' })
      .pmos('P2', { g: 'b', d: 'c', s: 'VDD' })
      .nmos('N2', { g: 'b', d: 'c', s: 'GND' })
      .build();
    const report = checkSequence(ring, [{ EN: '0' }, { EN: '1' }]);
    expect(report.steps![0]!.findings).toEqual([]);
    expect(report.steps![1]!.findings.map((f) => f.kind)).toContain('no-steady-state');
  });
  it('a latch that is only set and reset settles', () => {
    const latch = design('nand-latch');
    expect(checkSequence(latch.netlist, latch.sequences[0]!.steps).summary['no-steady-state']).toBe(0);
  });
});

describe('mismatch', () => {
  const nand = design('nand2');
  it('every differing vector is reported', () => {
    const report = checkSweep(nand.netlist, { expectations: { Y: 'A & B' } });
    expect(report.findings.filter((f) => f.kind === 'mismatch').map((f) => f.vector)).toEqual([0, 1, 2, 3]);
    // Vector 0 (A = B = 0): Y is driven high by both PMOS, which the finding names.
    expect(report.findings.find((f) => f.kind === 'mismatch')?.devices).toEqual(['PA', 'PB']);
  });
  it('the right function gives none', () => {
    expect(checkSweep(nand.netlist, { expectations: nand.expectations }).summary.mismatch).toBe(0);
  });
});

describe('rule checks', () => {
  it('flag bulk on the wrong rail, duplicate names, undriven gates, dangling nets, joined rails', () => {
    const cell = circuit('messy')
      .rails()
      .supply('VX')
      .ground('VX')
      .input('A')
      .output('Y')
      .pmos('P1', { g: 'A', d: 'Y', s: 'VDD', b: 'GND' })
      .nmos('N1', { g: 'A', d: 'Y', s: 'GND', b: 'sub' })
      .nmos('N1', { g: 'floatgate', d: 'Y', s: 'stub' })
      .build();
    const rules = checkSweep(cell)
      .findings.filter((f) => f.kind === 'rule')
      .map((f) => `${f.rule}:${f.severity}`);
    expect(rules).toEqual(
      expect.arrayContaining([
        'duplicate-name:error',
        'rails-joined:error',
        'gate-undriven:error',
        'bulk-connection:error',
        'bulk-connection:warning',
        'dangling-net:warning',
      ]),
    );
  });
  it('a clean inverter with conventional bulks has none', () => {
    const cell = circuit('inv')
      .rails()
      .input('A')
      .output('Y')
      .pmos('P1', { g: 'A', d: 'Y', s: 'VDD', b: 'VDD' })
      .nmos('N1', { g: 'A', d: 'Y', s: 'GND', b: 'GND' })
      .build();
    expect(checkSweep(cell).summary.rule).toBe(0);
  });
});

describe('limit of exact enumeration', () => {
  const parallel = (n: number) => {
    let b = circuit('wide').rails().output('Y').resistor('RL', 'VDD', 'Y', 1e6);
    const inputs: string[] = [];
    for (let i = 0; i < n; i++) {
      inputs.push(`G${i}`);
      b = b.nmos(`N${i}`, { g: `G${i}`, d: 'Y', s: 'GND' });
    }
    return b.input(...inputs).build();
  };
  const allX = (n: number) =>
    Object.fromEntries(Array.from({ length: n }, (_, i) => [`G${i}`, 'X' as const]));
  it('eleven devices with gates at X exceed the bound and say so', () => {
    const report = checkSequence(parallel(11), [allX(11)]);
    expect(kinds(report.findings)).toContain('limit');
    expect(report.steps![0]!.outputs.Y).toBe('X');
  });
  it('ten are enumerated exactly', () => {
    const report = checkSequence(parallel(10), [allX(10)]);
    expect(kinds(report.findings)).not.toContain('limit');
    expect(report.steps![0]!.outputs.Y).toBe('X');
  });
});
