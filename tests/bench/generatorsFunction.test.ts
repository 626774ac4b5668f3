/**
 * The benchmark's circuits really compute what they are named after, checked through the solver
 * against arithmetic and the textbook behaviour of each structure.
 */
import { describe, expect, it } from 'vitest';
import { compile } from '../../src/core/compile/compile.ts';
import type { InputVector } from '../../src/core/model/design.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { FLAG_DEGRADED, levelName } from '../../src/core/solver/levels.ts';
import { Simulator } from '../../src/core/solver/simulator.ts';
import {
  adderBank,
  inverterChain,
  muxTree,
  ratioedDecoder,
  rippleAdder,
} from '../../bench/generators/index.ts';
import { numbered } from '../../bench/generators/parts.ts';
import { operand, seededRandom } from '../../bench/vectors.ts';

const tech = DEFAULT_TECHNOLOGY;

/** Solves one vector; returns level, volts and flags by net name, and the supply current. */
function solve(netlist: Netlist, inputs: InputVector) {
  const compiled = compile(netlist, tech);
  const result = new Simulator(compiled).solveFresh(inputs);
  const at = (net: string): number => compiled.netIndex.get(net) as number;
  return {
    level: (net: string) => levelName(result.levels[at(net)]!),
    volts: (net: string) => result.volts[at(net)],
    degraded: (net: string) => (result.flags[at(net)]! & FLAG_DEGRADED) !== 0,
    supplyCurrent: result.supplyCurrent,
    paths: result.paths.length,
  };
}

/** The unsigned number spelled by the levels of `nets`, least significant first (NaN if any is not 0/1). */
function readWord(level: (net: string) => string, nets: readonly string[]): number {
  return nets.reduce((sum, n, i) => sum + (level(n) === '1' ? 2 ** i : level(n) === '0' ? 0 : NaN), 0);
}

describe('inverter chain', () => {
  it('inverts once per stage with full rail levels and no static current (static CMOS, common practice, no source)', () => {
    for (const stages of [4, 5]) {
      const s = solve(inverterChain(stages), { A: '1' });
      expect(s.level('Y')).toBe(stages % 2 === 0 ? '1' : '0');
      expect(s.volts('Y')).toBe(stages % 2 === 0 ? tech.vdd : 0);
      expect(s.paths).toBe(0);
    }
  });
});

describe('mirror ripple-carry adder', () => {
  it('gives S = A xor B xor C and Cout = majority for all 8 rows of the full-adder truth table (W&H 4th ed., eq. 11.1–11.2, from memory)', () => {
    const adder = rippleAdder(1);
    for (let row = 0; row < 8; row++) {
      const [a, b, c] = [row & 1, (row >> 1) & 1, (row >> 2) & 1];
      const s = solve(adder, { A0: a ? '1' : '0', B0: b ? '1' : '0', CI: c ? '1' : '0' });
      expect(s.level('S0'), `row ${row}`).toBe(String(a ^ b ^ c));
      expect(s.level('CO'), `row ${row}`).toBe(a + b + c >= 2 ? '1' : '0');
      expect(s.paths, `row ${row}`).toBe(0);
    }
  });

  it('adds seeded random 8-bit operands with carry-in (binary addition)', () => {
    const adder = rippleAdder(8);
    const random = seededRandom(2024);
    for (let trial = 0; trial < 24; trial++) {
      const a = Math.floor(random() * 256);
      const b = Math.floor(random() * 256);
      const ci = random() < 0.5 ? 1 : 0;
      const s = solve(adder, {
        ...operand(numbered('A', 8), a),
        ...operand(numbered('B', 8), b),
        CI: ci ? '1' : '0',
      });
      expect(readWord(s.level, [...numbered('S', 8), 'CO']), `${a} + ${b} + ${ci}`).toBe(a + b + ci);
    }
  });
});

describe('transmission-gate multiplexer tree', () => {
  it('passes D[S] to Y at full rail level for every select value (a transmission gate passes both levels undegraded, common practice, no source)', () => {
    const k = 3;
    const tree = muxTree(k);
    const random = seededRandom(7);
    for (let select = 0; select < 2 ** k; select++) {
      const data = Math.floor(random() * 256);
      const s = solve(tree, { ...operand(numbered('D', 8), data), ...operand(numbered('S', k), select) });
      const expected = (data >> select) & 1;
      expect(s.level('Y'), `select ${select}, data ${data}`).toBe(String(expected));
      expect(s.volts('Y')).toBe(expected ? tech.vdd : 0);
      expect(s.degraded('Y')).toBe(false);
    }
  });
});

describe('ratioed decoder (outputs active high)', () => {
  const k = 3;
  const decoder = ratioedDecoder(k);
  // On-resistance R_unit·L/W with the default technology: load 31 kΩ·0.25/0.5, pull-down 13 kΩ·0.25/1.
  const rLoad = (tech.rp * 0.25) / 0.5;
  const rDown = (tech.rn * 0.25) / 1;

  it('raises exactly the addressed line', () => {
    for (let address = 0; address < 2 ** k; address++) {
      const s = solve(decoder, operand(numbered('A', k), address));
      const high = numbered('Y', 2 ** k).filter((y) => s.level(y) === '1');
      expect(high).toEqual([`Y${address}`]);
      expect(numbered('Y', 2 ** k).filter((y) => s.level(y) === '0')).toHaveLength(2 ** k - 1);
    }
  });

  it('holds an unselected line at the voltage-divider VOL and draws the ratioed static current (Ohm’s law)', () => {
    // Address 0: line Y1 differs in one bit (one pull-down on), Y3 in two, Y7 in three.
    const s = solve(decoder, operand(numbered('A', k), 0));
    const vol = (m: number): number => (tech.vdd * (rDown / m)) / (rLoad + rDown / m);
    expect(vol(1)).toBeCloseTo(0.4333, 4); // 2.5 V · 3.25 kΩ / 18.75 kΩ, worked by hand
    expect(s.volts('Y1')).toBeCloseTo(vol(1), 9);
    expect(s.volts('Y3')).toBeCloseTo(vol(2), 9);
    expect(s.volts('Y7')).toBeCloseTo(vol(3), 9);
    // Lines differing in m bits: 3 with m = 1, 3 with m = 2, 1 with m = 3.
    const current = (m: number): number => tech.vdd / (rLoad + rDown / m);
    expect(s.supplyCurrent).toBeCloseTo(3 * current(1) + 3 * current(2) + current(3), 12);
  });
});

describe('adder bank', () => {
  it('makes adder r compute A + (B rotated left by r) with carry-in at GND', () => {
    const bank = adderBank();
    const random = seededRandom(99);
    const a = numbered('A', 8);
    const b = numbered('B', 8);
    for (let trial = 0; trial < 3; trial++) {
      const x = Math.floor(random() * 256);
      const y = Math.floor(random() * 256);
      const s = solve(bank, { ...operand(a, x), ...operand(b, y) });
      for (let r = 0; r < 8; r++) {
        const rotated = ((y << r) | (y >> (8 - r))) & 0xff; // 8-bit rotate left, computed directly
        const sum = readWord(s.level, [...numbered(`R${r}.S`, 8), `R${r}.CO`]);
        expect(sum, `adder ${r}: ${x} + rot(${y}, ${r})`).toBe(x + rotated);
      }
    }
  });
});
