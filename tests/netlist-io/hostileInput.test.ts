/**
 * Numbers out of their physical range, hierarchies too big or too deep to expand, and text after
 * `.end` (docs/semantics.md §6, §7). The ranges are our own generous bounds (common practice, no
 * source); each refusal names the file, the line and the field.
 */
import { describe, expect, it } from 'vitest';
import { importSpice, type SpiceImportError } from '../../src/core/netlist-io/spiceImport.ts';
import { refusalOf } from './refusal.ts';
import { MAX_FLAT_DEVICES } from '../../src/core/netlist-io/spiceHierarchy.ts';

const FILE = 'hostile.sp';

function refusal(text: string): SpiceImportError {
  return refusalOf(text, FILE);
}

const cell = (line: string) => `.subckt c A Y vdd gnd\nMP Y A vdd vdd pch W=1u L=0.25u\n${line}\n.ends\n`;

describe('every number in its range, located', () => {
  it.each([
    ['MN Y A gnd gnd nch W=1u L=0.25u m=1e400', /MN: m=1e400 is not a finite number/],
    ['MN Y A gnd gnd nch W=1u L=0.25u m=1e18', /MN: m=1e18 is outside a whole number from 1 to 100,000/],
    ['MN Y A gnd gnd nch W=1u L=0.25u m=2.5', /MN: m=2\.5 is not a whole number/],
    ['MN Y A gnd gnd nch W=1e300 L=0.25u', /MN: W=1e300 is 1e\+300 m/],
    ['MN Y A gnd gnd nch W=1e-320 L=0.25u', /MN: W=1e-320 \(.* µm\) is outside 1 nm to 1 cm/],
    ['MN Y A gnd gnd nch W=100u L=0.25u m=20000', /MN: W×m = 2000000 µm is wider than 1 m/],
    ['R1 vdd Y 1e-300', /R1: ohms 1e-300 is outside 1 mΩ to 1 TΩ/],
    ['R1 vdd Y 1e400', /R1: ohms 1e400 is not a finite number/],
    ['C1 Y gnd 1e-320', /C1: farads 1e-320 is outside 1 zF to 1 µF/],
  ])('%s', (line, message) => {
    const e = refusal(cell(line));
    expect(e.line).toBe(3);
    expect(e.file).toBe(FILE);
    expect(e.message).toMatch(message);
  });

  it('refuses a supply of 1e400 V on its line', () => {
    const e = refusal(`* supply\nV1 vdd 0 1e400\n${cell('MN Y A gnd gnd nch W=1u L=0.25u')}`);
    expect(e.line).toBe(2);
    expect(e.message).toMatch(/V1: volts 1e400 is not a finite number/);
  });
});

/** `levels` doubling subcircuits: each instantiates the one below twice; 2^levels inverters. */
function doubling(levels: number): string {
  const lines = [
    '.subckt l0 A Y vdd gnd',
    'MP Y A vdd vdd pch W=1u L=0.25u',
    'MN Y A gnd gnd nch W=1u L=0.25u',
    '.ends',
  ];
  for (let i = 1; i <= levels; i++)
    lines.push(`.subckt l${i} A Y vdd gnd`, `X1 A m l${i - 1}`, `X2 m Y l${i - 1}`, '.ends');
  return lines.join('\n').replace(/X(\d) (\S+) (\S+) (l\d+)/g, 'X$1 $2 $3 vdd gnd $4');
}

describe('hierarchies sized before they are expanded', () => {
  it('refuses 24 doubling levels (2^25 transistors) at once, naming the chain', () => {
    const text = doubling(24);
    expect(text.split('\n').length).toBeLessThan(110);
    const started = process.cpuUsage();
    const e = refusal(text);
    const cpu = process.cpuUsage(started);
    expect(cpu.user + cpu.system).toBeLessThan(5e6); // refused before anything is expanded
    expect(e.message).toContain(
      `cell l24 would flatten to 33,554,432 devices, more than the limit of ${MAX_FLAT_DEVICES.toLocaleString('en-US')}`,
    );
    expect(e.message).toMatch(/l24 → X1 \(l23, line \d+, 16,777,216 devices\) → X1 \(l22/);
  });

  it('flattens 2,500 nested single-instance subcircuits without using the JavaScript stack', () => {
    const lines = [
      '.subckt s0 A Y vdd gnd',
      'MP Y A vdd vdd pch W=1u L=0.25u',
      'MN Y A gnd gnd nch W=1u L=0.25u',
      '.ends',
    ];
    for (let i = 1; i <= 2500; i++)
      lines.push(`.subckt s${i} A Y vdd gnd`, `X1 A Y vdd gnd s${i - 1}`, '.ends');
    const r = importSpice(lines.join('\n'), FILE);
    expect(r.cells[0]?.netlist.devices).toHaveLength(2);
    expect(r.cells[0]?.netlist.devices[0]?.name).toBe(`${'X1.'.repeat(2500)}MP`);
  });

  it('refuses a subcircuit that instantiates itself, naming the loop and the line', () => {
    const e = refusal('.subckt a A\nX1 A b\n.ends\n.subckt b A\nX1 A a\n.ends\n.subckt top A\nX1 A a\n.ends');
    expect(e.message).toMatch(/X1: subcircuit a instantiates itself \(a → b → a\)/);
  });

  it('sets a huge cell of a library aside and checks the others', () => {
    const text = `${doubling(22)}\n.subckt other A Y vdd gnd\nMN Y A gnd gnd nch W=1u L=0.25u\n.ends`;
    const r = importSpice(text, FILE, { topOnly: true });
    expect(r.cells.map((c) => c.name)).toEqual(['other']);
    expect(r.failed.map((f) => f.name)).toEqual(['l22']);
  });
});

describe('what comes after .end', () => {
  it('is ignored as SPICE ignores it, with a note naming the lines and the subcircuits there', () => {
    const text = `${cell('MN Y A gnd gnd nch W=1u L=0.25u')}.end\n.subckt late A\nMN A A gnd gnd nch\n.ends\n`;
    const r = importSpice(text, FILE);
    expect(r.cells.map((c) => c.name)).toEqual(['c']);
    expect(r.notes).toContain(
      'lines 6–8 come after .end (line 5) and are ignored, as SPICE ignores them, including subcircuits late, which are not checked',
    );
  });
});

describe('a first line that is an element with a value out of range', () => {
  it('is refused on line 1, not taken for a title', () => {
    const e = refusalOf('R1 vdd y 1e-300\nMN y a 0 0 nch W=1u L=0.25u\n', FILE);
    expect(e.line).toBe(1);
    expect(e.message).toMatch(/R1: ohms 1e-300 is outside 1 mΩ to 1 TΩ/);
  });
});
