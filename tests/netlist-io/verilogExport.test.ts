/**
 * Structural Verilog export against IEEE Std 1364-2005: clause 7 (gate- and switch-level
 * modelling): 7.5 MOS switches list their terminals as output, data input, control input; 7.6
 * bidirectional pass switches as inout, inout, control (tranif) or inout, inout (rtran); 3.7.1
 * escaped identifiers start with a backslash and end with white space. Subclause numbers from
 * memory; the same rules appear in IEEE Std 1800-2017 clause 28.
 */
import { describe, expect, it } from 'vitest';
import { circuit } from '../../src/core/model/builder.ts';
import { exportVerilog, identifier } from '../../src/core/netlist-io/verilogExport.ts';

const inverter = circuit('inv')
  .rails()
  .input('A')
  .output('Y')
  .pmos('P1', { g: 'A', d: 'Y', s: 'VDD' })
  .nmos('N1', { g: 'A', d: 'Y', s: 'GND' })
  .build();

describe('Verilog switch-level export', () => {
  it('lists MOS terminals as (output, data, control), IEEE Std 1364-2005 clause 7.5', () => {
    const v = exportVerilog(inverter);
    expect(v).toContain('pmos P1 (Y, VDD, A);');
    expect(v).toContain('nmos N1 (Y, GND, A);');
  });

  it('declares the ports, the rails as supply1/supply0 nets and the internal nets as wires', () => {
    const nand = circuit('nand2')
      .rails()
      .input('A', 'B')
      .output('Y')
      .pmos('P1', { g: 'A', d: 'Y', s: 'VDD' })
      .pmos('P2', { g: 'B', d: 'Y', s: 'VDD' })
      .nmos('N1', { g: 'A', d: 'Y', s: 'n1' })
      .nmos('N2', { g: 'B', d: 'n1', s: 'GND' })
      .build();
    const v = exportVerilog(nand);
    expect(v).toMatch(/^module nand2 \(A, B, Y\);$/m);
    expect(v).toContain('  input A, B;\n  output Y;\n  supply1 VDD;\n  supply0 GND;\n  wire n1;');
    // The upper NMOS of the stack passes the low level from n1 up to Y: data n1, output Y.
    expect(v).toContain('nmos N1 (Y, n1, A);');
    expect(v).toContain('nmos N2 (n1, GND, B);');
    expect(v.trimEnd().endsWith('endmodule')).toBe(true);
  });

  it('orients a pass transistor from the input pin that drives it', () => {
    const tg = circuit('tg')
      .rails()
      .input('D', 'EN', 'ENB')
      .output('Y')
      .nmos('N1', { g: 'EN', d: 'Y', s: 'D' })
      .pmos('P1', { g: 'ENB', d: 'D', s: 'Y' })
      .build();
    const v = exportVerilog(tg);
    expect(v).toContain('nmos N1 (Y, D, EN);');
    expect(v).toContain('pmos P1 (Y, D, ENB);');
  });

  it('makes a pass device between two equally driven nets a bidirectional tranif switch (7.6)', () => {
    const bridge = circuit('bridge')
      .rails()
      .input('S')
      .output('P', 'Q')
      .nmos('N1', { g: 'S', d: 'P', s: 'Q' })
      .build();
    expect(exportVerilog(bridge)).toContain('tranif1 N1 (P, Q, S);');
    const pbridge = circuit('pbridge')
      .rails()
      .input('S')
      .output('P', 'Q')
      .pmos('P1', { g: 'S', d: 'P', s: 'Q' })
      .build();
    expect(exportVerilog(pbridge)).toContain('tranif0 P1 (P, Q, S);');
  });

  it('writes resistors as rtran and capacitors and diodes as comments', () => {
    const load = circuit('rload')
      .rails()
      .input('A')
      .output('Y')
      .resistor('R1', 'VDD', 'Y', 40e3)
      .nmos('N1', { g: 'A', d: 'Y', s: 'GND' })
      .capacitor('C1', 'Y', 'GND', 1e-14)
      .diode('D1', 'GND', 'A')
      .build();
    const v = exportVerilog(load);
    expect(v).toContain('rtran R1 (VDD, Y); // 40000 ohm');
    expect(v).toMatch(/^ {2}\/\/ C1: 1e-14 F between Y and GND/m);
    expect(v).toMatch(/^ {2}\/\/ D1: protection diode/m);
  });

  it('escapes names that are not simple identifiers or that are keywords (3.7.1)', () => {
    expect(identifier('n_1$a')).toBe('n_1$a');
    expect(identifier('X1/n3')).toBe('\\X1/n3 ');
    expect(identifier('0')).toBe('\\0 ');
    expect(identifier('output')).toBe('\\output ');
    expect(identifier('vdd!')).toBe('\\vdd! ');
  });
});
