/**
 * The SPICE-compatible importer against every rule of docs/semantics.md §6. The netlist conventions checked here
 * (comment and continuation lines, scale suffixes, element letters, node 0 as ground, `.subckt`
 * ports) are those of Berkeley SPICE as the trade uses them (SPICE3 user's manual, "general
 * structure and conventions"; from memory) unless marked as our own.
 */
import { describe, expect, it } from 'vitest';
import { importSpice, SpiceImportError, type SpiceImport } from '../../src/core/netlist-io/spiceImport.ts';
import type { MosDevice, Netlist } from '../../src/core/model/netlist.ts';

const FILE = 'cells/test.sp';

function only(text: string, options = {}): Netlist {
  const result = importSpice(text, FILE, options);
  expect(result.cells).toHaveLength(1);
  return (result.cells[0] as SpiceImport['cells'][number]).netlist;
}

function errorOf(text: string): SpiceImportError {
  try {
    importSpice(text, FILE);
  } catch (e) {
    if (e instanceof SpiceImportError) return e;
    throw e;
  }
  throw new Error('expected a SpiceImportError');
}

function mos(n: Netlist, name: string): MosDevice {
  const d = n.devices.find((x) => x.name === name);
  if (d?.kind !== 'nmos' && d?.kind !== 'pmos') throw new Error(`no MOS ${name}`);
  return d;
}

const INVERTER = `* inverter
.subckt inv A Y VDD GND
MP Y A VDD VDD pch W=2u L=0.25u
MN Y A GND GND nch W=1u L=0.25u
.ends
`;

describe('lines and comments', () => {
  it('drops * comment lines and cuts $ and ; inline comments', () => {
    const n = only(`* a comment
.subckt inv A Y VDD GND   $ the ports
MP Y A VDD VDD pch W=2u L=0.25u ; pull-up
MN Y A GND GND nch W=1u L=0.25u $ pull-down
.ends`);
    expect(n.devices.map((d) => d.name)).toEqual(['MP', 'MN']);
    expect(n.inputs).toEqual(['A']);
  });

  it('joins + continuation lines, also across comment lines', () => {
    const n = only(`.subckt inv A Y VDD GND
MP Y A VDD VDD pch
* the sizes follow
+ W=2u
+ L=0.5u
MN Y A GND GND nch W=1u L=0.25u
.ends`);
    expect(mos(n, 'MP')).toMatchObject({ w: 2, l: 0.5 });
  });

  it('joins a + line to its statement across a railwise directive, which keeps its own place', () => {
    // Our own directive form (docs/semantics.md §6); the join is SPICE's continuation rule.
    const result = importSpice(
      `.subckt inv A Y VDD GND
MP Y A VDD VDD pch
* railwise: expect Y = !A
+ W=2u L=0.5u
MN Y A GND GND nch W=1u L=0.25u
.ends`,
      FILE,
    );
    const cell = result.cells[0] as SpiceImport['cells'][number];
    expect(mos(cell.netlist, 'MP')).toMatchObject({ w: 2, l: 0.5 });
    expect(cell.expectations).toEqual({ Y: '!A' });
    expect(cell.expectationLines).toEqual({ Y: 3 });
  });

  it('reads devices that repeat one parameter list each with its own values', () => {
    // Lines that give the same parameters share one reading (kept once to save memory; our own
    // rule, no source): a line with other values must not see an earlier line's, nor change it.
    const n = only(`.subckt two A Y VDD GND
MP1 Y A VDD VDD pch W=2u L=0.5u
MP2 Y A VDD VDD pch W=2u L=0.5u
MN1 Y A GND GND nch W=1u L=0.25u m=2
MN2 Y A GND GND nch W=1u L=0.25u
.ends`);
    expect(n.devices.map((d) => ('w' in d ? [d.name, d.w, d.l] : []))).toEqual([
      ['MP1', 2, 0.5],
      ['MP2', 2, 0.5],
      ['MN1', 2, 0.25],
      ['MN2', 1, 0.25],
    ]);
  });

  it('is case-insensitive for commands, parameters, model names and nets', () => {
    const n = only(`.SUBCKT INV a y vdd gnd
MP Y A VDD VDD PCH w=2U l=0.25U
MN y a gnd GND Nch W=1u L=0.25u
.ENDS INV`);
    expect(n.devices).toHaveLength(2);
    expect(mos(n, 'MN')).toMatchObject({ kind: 'nmos', gate: 'a', drain: 'y' });
    expect(mos(n, 'MP')).toMatchObject({ kind: 'pmos', gate: 'a', drain: 'y', w: 2 });
  });

  it('reads the first line as a title when it is no element, with a note', () => {
    const result = importSpice(`Lamp inverter test\n${INVERTER}`, FILE);
    expect(result.notes.some((n) => n.includes('title'))).toBe(true);
    expect(result.cells[0]?.name).toBe('inv');
  });

  it('ignores a byte-order mark and Windows line ends', () => {
    const n = only(`\uFEFF${INVERTER.replace(/\n/g, '\r\n')}`);
    expect(n.devices.map((d) => d.name)).toEqual(['MP', 'MN']);
  });

  it('skips analysis commands with a note', () => {
    const result = importSpice(`${INVERTER}.option post\n.tran 1p 1n\n.end\n.tran ignored after end`, FILE);
    expect(result.notes.filter((n) => n.includes('does not change the network'))).toHaveLength(2);
  });
});

describe('numbers', () => {
  it('reads 2u, 740.00n and 1.12e-06 metres as micrometres, exactly', () => {
    const n = only(`.subckt s A Y VDD GND
M1 Y A GND GND nch W=2u L=740.00n
M2 Y A GND GND nch W=1.12e-06 L=0.25u
M3 Y A VDD VDD pch W=1.5u L=250n
.ends`);
    expect(mos(n, 'M1')).toMatchObject({ w: 2, l: 0.74 });
    expect(mos(n, 'M2').w).toBe(1.12);
    expect(mos(n, 'M3')).toMatchObject({ w: 1.5, l: 0.25 });
  });

  it('reads the scale suffixes f p n u m k meg g (common practice, no source)', () => {
    const n = only(`.subckt s A Y VDD GND
M1 Y A GND GND nch W=1u L=0.25u
R1 Y n1 10k
R2 n1 n2 1meg
R3 n2 n3 1g
R4 n3 n4 5m
C1 Y GND 2f
C2 Y GND 3p
C3 Y GND 4n
C4 Y GND 10pF
.ends`);
    const values = n.devices.flatMap((d) =>
      d.kind === 'resistor' ? [d.ohms] : d.kind === 'capacitor' ? [d.farads] : [],
    );
    expect(values).toEqual([10e3, 1e6, 1e9, 5e-3, 2e-15, 3e-12, 4e-9, 10e-12]);
  });
});

describe('devices', () => {
  it('takes the MOS type from a .model card, wherever the card is', () => {
    const n = only(`.subckt s A Y VDD GND
M1 Y A GND GND fast W=1u L=0.25u
M2 Y A VDD VDD slow W=1u L=0.25u
.ends
.model fast nmos level=1
.model slow pmos (level=1 vto=-0.4)`);
    expect([mos(n, 'M1').kind, mos(n, 'M2').kind]).toEqual(['nmos', 'pmos']);
  });

  it('falls back to the model name: nmos pmos nch pch nfet pfet', () => {
    const n = only(`.subckt s A Y VDD GND
M1 Y A GND GND my_nmos_lvt W=1u L=0.25u
M2 Y A VDD VDD PMOS W=1u L=0.25u
M3 Y A GND GND nch_mac W=1u L=0.25u
M4 Y A VDD VDD pch W=1u L=0.25u
M5 Y A GND GND nfet W=1u L=0.25u
M6 Y A VDD VDD pfet_hv W=1u L=0.25u
.ends`);
    expect(n.devices.map((d) => d.kind)).toEqual(['nmos', 'pmos', 'nmos', 'pmos', 'nmos', 'pmos']);
  });

  it('folds m= into the width (parallel devices) and notes ignored instance parameters', () => {
    const result = importSpice(
      `.subckt s A Y VDD GND
M1 Y A GND GND nch W=1u L=0.25u m=3 ad=1p as=1p pd=4u
M2 Y A VDD VDD pch W=2u L=0.25u
.ends`,
      FILE,
    );
    const cell = result.cells[0];
    expect(mos(cell?.netlist as Netlist, 'M1').w).toBe(3);
    expect(cell?.notes.join('\n')).toMatch(/ignored: ad, as, pd/);
    expect(cell?.notes.join('\n')).toMatch(/m= folded into W.*M1/);
  });

  it('keeps the bulk terminal', () => {
    expect(mos(only(INVERTER), 'MN').bulk).toBe('GND');
  });

  it('reads R and C lines', () => {
    const n = only(`.subckt s A Y VDD GND
RL VDD Y 40k
M1 Y A GND GND nch W=1u L=0.25u
CL Y GND 15f
.ends`);
    expect(n.devices).toContainEqual({ kind: 'resistor', name: 'RL', a: 'VDD', b: 'Y', ohms: 40e3 });
    expect(n.devices).toContainEqual({ kind: 'capacitor', name: 'CL', a: 'Y', b: 'GND', farads: 15e-15 });
  });

  it('keeps D lines as protection diodes and says so', () => {
    const result = importSpice(
      `.subckt s A Y VDD GND
DP A VDD esd
DN GND A esd
M1 Y A GND GND nch W=1u L=0.25u
M2 Y A VDD VDD pch W=2u L=0.25u
.ends`,
      FILE,
    );
    const cell = result.cells[0];
    expect(cell?.netlist.devices).toContainEqual({ kind: 'diode', name: 'DP', anode: 'A', cathode: 'VDD' });
    expect(cell?.notes.join('\n')).toMatch(/protection diodes.*DP, DN/);
    // A diode is not a channel: A still only reaches gates, so it stays an input.
    expect(cell?.netlist.inputs).toEqual(['A']);
  });
});

describe('hierarchy', () => {
  const BUFFER = `${INVERTER}
.subckt buf A Y VDD GND
X1 A mid VDD GND inv
X2 mid Y VDD GND inv
.ends`;

  it('flattens X instances with hierarchical device and net names', () => {
    const n = only(BUFFER);
    expect(n.name).toBe('buf');
    expect(n.devices.map((d) => d.name)).toEqual(['X1.MP', 'X1.MN', 'X2.MP', 'X2.MN']);
    expect(mos(n, 'X2.MN')).toMatchObject({ gate: 'mid', drain: 'Y', source: 'GND' });
  });

  it('reads the CDL form of an instance, with a / before the subcircuit name', () => {
    const n = only(
      `${INVERTER}.subckt buf A Y VDD GND\nX1 A mid VDD GND / inv\nX2 mid Y VDD GND / inv\n.ends`,
    );
    expect(n.devices).toHaveLength(4);
  });

  it('prefixes internal nets of nested instances with the instance path', () => {
    const n = only(`.subckt leaf A Y VDD GND
M1 n A GND GND nch W=1u L=0.25u
M2 Y n VDD VDD pch W=1u L=0.25u
.ends
.subckt mid A Y VDD GND
X7 A Y VDD GND leaf
.ends
.subckt top A Y VDD GND
X3 A Y VDD GND mid
.ends`);
    expect(mos(n, 'X3.X7.M1').drain).toBe('X3.X7.n');
  });

  it('keeps rail names and .global nets global inside subcircuits', () => {
    const n = only(
      `.global vpwr!
.subckt leaf A Y
M1 Y A gnd gnd nch W=1u L=0.25u
M2 Y A vpwr! vpwr! pch W=1u L=0.25u
.ends
.subckt top A Y
X1 A Y leaf
.ends`,
      { supplyNames: ['vpwr'] },
    );
    expect(mos(n, 'X1.M2').source).toBe('vpwr!');
    expect(n.rails).toEqual([
      { net: 'gnd', role: 'ground' },
      { net: 'vpwr!', role: 'supply' },
    ]);
  });
});

describe('rails', () => {
  it('takes 0, gnd and vss as ground and vdd and vcc as supply, with an optional trailing !', () => {
    const n = only(`.subckt s A Y vdd! VCC gnd! Vss
M1 Y A 0 0 nch W=1u L=0.25u
.ends`);
    expect(n.rails).toEqual([
      { net: 'vdd!', role: 'supply' },
      { net: 'VCC', role: 'supply' },
      { net: 'gnd!', role: 'ground' },
      { net: 'Vss', role: 'ground' },
      { net: '0', role: 'ground' },
    ]);
    expect(n.outputs).toEqual(['Y']);
  });

  it('adds rail names from the options', () => {
    const n = only(
      `.subckt s A Y VPWR VGND
M1 Y A VGND VGND nch W=1u L=0.25u
M2 Y A VPWR VPWR pch W=1u L=0.25u
.ends`,
      { supplyNames: ['vpwr'], groundNames: ['VGND'] },
    );
    expect(n.rails.map((r) => `${r.net}:${r.role}`)).toEqual(['VPWR:supply', 'VGND:ground']);
    expect(n.outputs).toEqual(['Y']);
  });

  it('makes a net held by a V line to ground a supply of that voltage, and 0 V a ground', () => {
    const n = only(`.subckt s A Y VIO VQ
VIO VIO 0 DC 3.3
VQ VQ 0 0
M1 Y A VQ VQ nch W=1u L=0.25u
M2 Y A VIO VIO pch W=1u L=0.25u
.ends`);
    expect(n.rails).toEqual([
      { net: 'VIO', role: 'supply', volts: 3.3 },
      { net: 'VQ', role: 'ground' },
      { net: '0', role: 'ground' },
    ]);
  });

  it('applies top-level V lines of a library to every cell', () => {
    const result = importSpice(
      `V1 vpwr 0 1.8
.subckt a A Y vpwr 0
M1 Y A 0 0 nch W=1u L=0.25u
.ends
.subckt b A Y vpwr 0
M1 Y A vpwr vpwr pch W=1u L=0.25u
.ends`,
      FILE,
    );
    expect(result.isLibrary).toBe(true);
    for (const cell of result.cells)
      expect(cell.netlist.rails[0]).toEqual({ net: 'vpwr', role: 'supply', volts: 1.8 });
  });
});

describe('pins', () => {
  it('takes ports that only reach gates as inputs, in port order, and the other non-rail ports as outputs', () => {
    const n = only(`.subckt aoi B A2 Y A1 VDD GND
MP1 p1 A1 VDD VDD pch W=2u L=0.25u
MP2 p1 A2 VDD VDD pch W=2u L=0.25u
MP3 Y B p1 VDD pch W=2u L=0.25u
MN1 Y A1 n1 GND nch W=1u L=0.25u
MN2 n1 A2 GND GND nch W=1u L=0.25u
MN3 Y B GND GND nch W=1u L=0.25u
.ends`);
    expect(n.inputs).toEqual(['B', 'A2', 'A1']);
    expect(n.outputs).toEqual(['Y']);
  });

  it('takes a transmission gate data port as an output unless told otherwise (our own directive)', () => {
    const tg = `.subckt tg D Y EN ENB VDD GND
MN D EN Y GND nch W=1u L=0.25u
MP D ENB Y VDD pch W=1u L=0.25u
.ends`;
    expect(only(tg)).toMatchObject({ inputs: ['EN', 'ENB'], outputs: ['D', 'Y'] });
    const told = tg.replace('.ends', '* railwise: inputs D EN ENB\n.ends');
    expect(only(told)).toMatchObject({ inputs: ['D', 'EN', 'ENB'], outputs: ['Y'] });
  });

  it('guesses the outputs of a flat netlist as the nets that reach no gate, with a note', () => {
    const result = importSpice(
      `MP Y A vdd vdd pch W=2u L=0.25u
MN Y A 0 0 nch W=1u L=0.25u
`,
      'lamp.sp',
    );
    const cell = result.cells[0];
    expect(cell?.name).toBe('lamp');
    expect(cell?.netlist).toMatchObject({ inputs: ['A'], outputs: ['Y'] });
    expect(cell?.notes.join('\n')).toMatch(/flat netlist/);
  });

  it('reads expected functions from our own directive', () => {
    const result = importSpice(INVERTER.replace('.ends', '* railwise: expect y = !A\n.ends'), FILE);
    expect(result.cells[0]?.expectations).toEqual({ Y: '!A' });
  });
});

describe('errors name the file and the line', () => {
  const cases: readonly [string, string, number, RegExp][] = [
    [
      'unsupported element',
      `.subckt s A Y VDD GND\nM1 Y A GND GND nch W=1u L=0.25u\nQ1 Y A GND npn\n.ends`,
      3,
      /bipolar/,
    ],
    ['MOS type unknown', `.subckt s A Y VDD GND\nM1 Y A GND GND core W=1u L=0.25u\n.ends`, 2, /nmos or pmos/],
    [
      'model of another type',
      `.model core d\n.subckt s A Y VDD GND\nM1 Y A GND GND core\n.ends`,
      3,
      /d model \(line 1\)/,
    ],
    ['MOS line too short', `.subckt s A Y VDD GND\n\nM1 Y A nch\n.ends`, 3, /drain, gate, source/],
    ['width without unit', `.subckt s A Y VDD GND\nM1 Y A GND GND nch W=1 L=0.25u\n.ends`, 2, /write 1u/],
    ['bad resistor value', `.subckt s A Y VDD GND\nR1 A Y ten\n.ends`, 2, /positive resistance/],
    [
      'parameter expression',
      `.subckt s A Y VDD GND\nM1 Y A GND GND nch W={2*wn} L=0.25u\n.ends`,
      2,
      /expressions/,
    ],
    [
      'time-varying source',
      `* stimulus\nV1 A 0 PULSE(0 2.5 0 1n 1n 5n 10n)\nM1 Y A 0 0 nch W=1u L=0.25u`,
      2,
      /time-varying/,
    ],
    [
      'source between two nets',
      `.subckt s A Y VDD GND\nV1 A Y 1\nM1 Y A GND GND nch W=1u L=0.25u\n.ends`,
      2,
      /to ground/,
    ],
    [
      'undefined subcircuit',
      `.subckt s A Y VDD GND\n\nX1 A Y VDD GND nowhere\n.ends`,
      3,
      /nowhere is not defined/,
    ],
    [
      'port count',
      `${INVERTER}.subckt s A Y VDD GND\nX1 A Y VDD inv\n.ends`,
      7,
      /3 nets given, subcircuit inv has 4/,
    ],
    ['missing .ends', `* cell\n.subckt s A Y VDD GND\nM1 Y A GND GND nch W=1u L=0.25u\n`, 2, /has no .ends/],
    ['stray .ends', `M1 Y A 0 0 nch W=1u L=0.25u\n.ends`, 2, /without a .subckt/],
    ['nested .subckt', `.subckt s A Y VDD GND\n.subckt t A Y\n.ends\n.ends`, 2, /inside .subckt s/],
    ['duplicate .subckt', `${INVERTER}.SUBCKT INV A Y VDD GND\n.ends`, 6, /already defined on line 2/],
    ['.include', `.include models.lib\n${INVERTER}`, 1, /not supported/],
    ['unknown command', `${INVERTER}.frobnicate`, 6, /not a command/],
    ['continuation first', `+ W=1u\n${INVERTER}`, 1, /continuation/],
    [
      'recursion',
      `.subckt s A Y VDD GND\nX1 A Y VDD GND s\n.ends\n.subckt top A Y VDD GND\nX1 A Y VDD GND s\n.ends`,
      2,
      /instantiates itself/,
    ],
    [
      'unknown pin in directive',
      `${INVERTER.replace('.ends', '* railwise: inputs Q\n.ends')}`,
      5,
      /no net "Q"/,
    ],
  ];

  it.each(cases)('%s', (_what, text, line, message) => {
    const e = errorOf(text);
    expect(e.file).toBe(FILE);
    expect(e.line).toBe(line);
    expect(e.message).toMatch(message);
    expect(e.message.startsWith(`${FILE}:${line}: `)).toBe(true);
  });
});
