/**
 * Level-1 values from SPICE `.model` cards (docs/semantics.md §1, "Model cards"). The card syntax
 * (`.model NAME TYPE (key=value …)`, parentheses optional, LEVEL 1 when absent) and the meaning of
 * VTO (volts, negative for an enhancement PMOS), KP (A/V²), GAMMA (V^½), PHI (volts, the surface
 * potential 2φF) and LAMBDA (1/V) are those of Berkeley SPICE's level-1 MOSFET (SPICE3 user's
 * manual, MOSFET model parameters; from memory).
 */
import { describe, expect, it } from 'vitest';
import { level1Device } from '../../src/core/dc/network.ts';
import type { MosDevice, Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY, type Technology } from '../../src/core/model/technology.ts';
import { cellsFromText, type CellJob } from '../../src/core/netlist-io/cellFiles.ts';
import { exportSpice } from '../../src/core/netlist-io/spiceExport.ts';
import type { SpiceImportError } from '../../src/core/netlist-io/spiceImport.ts';
import { refusalOf } from './refusal.ts';

const FILE = 'cards.sp';

function job(text: string): CellJob {
  const [cell] = cellsFromText(text, FILE).cells;
  if (cell === undefined || !('job' in cell)) throw new Error(JSON.stringify(cell));
  return cell.job;
}

function mos(n: Netlist, name: string): MosDevice {
  const d = n.devices.find((x) => x.name === name);
  if (d?.kind !== 'nmos' && d?.kind !== 'pmos') throw new Error(`no MOS ${name}`);
  return d;
}

function refusal(text: string): SpiceImportError {
  return refusalOf(text, FILE);
}

const inverter = (nModel: string, pModel: string, cards: string): string => `.subckt inv A Y VDD GND
MP Y A VDD VDD ${pModel} W=1u L=0.5u
MN Y A GND GND ${nModel} W=1u L=0.5u
.ends
${cards}`;

describe('reading a card', () => {
  const text = inverter(
    'nch',
    'pch',
    `.model nch nmos (level=1 vto=0.7 kp=110u gamma=0.45 phi=0.9 lambda=0.05)
.model pch pmos level=1, vto=-0.8, kp=40e-6, gamma = 0.5, phi=0.8v, lambda=0.1`,
  );

  it('takes vto, kp, gamma, phi and lambda in volts, A/V², V^½, volts and 1/V', () => {
    const { netlist, technology } = job(text);
    expect(mos(netlist, 'MN').model).toBe('nch');
    expect(mos(netlist, 'MP').model).toBe('pch');
    expect(technology.models).toEqual({
      nch: { type: 'nmos', vt0: 0.7, kp: 110e-6, gamma: 0.45, phi: 0.9, lambda: 0.05 },
      // An enhancement PMOS card writes VTO negative; the technology keeps its magnitude, as vtp.
      pch: { type: 'pmos', vt0: 0.8, kp: 40e-6, gamma: 0.5, phi: 0.8, lambda: 0.1 },
    });
  });

  it('is what the DC model reads for those devices (β = kp·W/L)', () => {
    const { netlist, technology } = job(text);
    expect(level1Device(mos(netlist, 'MN'), technology)).toEqual({
      polarity: 1,
      beta: 110e-6 * 2,
      vt0: 0.7,
      gamma: 0.45,
      phi: 0.9,
      lambda: 0.05,
    });
    expect(level1Device(mos(netlist, 'MP'), technology).vt0).toBe(0.8);
  });

  it('leaves what a card does not give to the technology, and says so; LEVEL 1 when absent', () => {
    const only = job(inverter('nch', 'pmos', '.model nch nmos vto=0.6'));
    expect(only.technology.models).toEqual({ nch: { type: 'nmos', vt0: 0.6 } });
    const d = level1Device(mos(only.netlist, 'MN'), only.technology);
    expect(d).toMatchObject({
      vt0: 0.6,
      gamma: DEFAULT_TECHNOLOGY.gamman,
      lambda: DEFAULT_TECHNOLOGY.lambdan,
    });
    expect(d.beta).toBeCloseTo(DEFAULT_TECHNOLOGY.kpn * 2, 12);
    expect(only.notes.join('\n')).toMatch(/nch \(line 5\) gives no kp, gamma, phi, lambda/);
    // The PMOS names no card: it takes the technology's values and carries no model.
    expect(mos(only.netlist, 'MP').model).toBeUndefined();
  });

  it('notes parameters it does not read', () => {
    const notes = job(
      inverter('nch', 'pmos', '.model nch nmos (level=1 vto=0.6 kp=100u tox=5n uo=450)'),
    ).notes;
    expect(notes.join('\n')).toMatch(/tox, uo not read/);
  });

  it('carries only the cards the devices name', () => {
    const { technology } = job(
      inverter('nch', 'pch', '.model nch nmos vto=0.6\n.model pch pmos vto=-0.6\n.model spare nmos vto=1'),
    );
    expect(Object.keys(technology.models ?? {}).sort()).toEqual(['nch', 'pch']);
  });
});

describe('cards that are not read', () => {
  it('another level gives a note, and its devices take the technology values', () => {
    const cell = job(inverter('nch', 'pmos', '.model nch nmos (level=49 version=3.3 vth0=0.4)'));
    expect(mos(cell.netlist, 'MN').model).toBeUndefined();
    expect(cell.technology.models).toBeUndefined();
    expect(cell.notes.join('\n')).toMatch(/nch \(line 5\) is level 49: only level-1 cards are read/);
  });

  it('binned cards give the type only, with a note', () => {
    const cell = job(inverter('nch', 'pmos', '.model nch.1 nmos (level=1 vto=0.7 lmin=0.1u)'));
    expect(mos(cell.netlist, 'MN')).toMatchObject({ kind: 'nmos' });
    expect(mos(cell.netlist, 'MN').model).toBeUndefined();
    expect(cell.notes.join('\n')).toMatch(/model nch is binned/);
  });

  it('a card of a type that is not nmos or pmos is refused where a transistor names it, ignored elsewhere', () => {
    // Refused at the transistor's line (3), naming the card's line.
    const error = refusal(inverter('core', 'pmos', '.model core xyz'));
    expect(error.line).toBe(3);
    expect(error.message).toMatch(/core is a xyz model \(line 5\), not nmos or pmos/);
    expect(job(inverter('nmos', 'pmos', '.model core xyz')).technology.models).toBeUndefined();
  });
});

describe('bad cards are refused at their line, naming the parameter', () => {
  const cases: [string, string, RegExp][] = [
    ['not a number', '.model nch nmos (level=1 kp=fast)', /MN uses \.model nch: kp=fast is not a number/],
    ["k' in µA without its suffix", '.model nch nmos kp=110', /kp=110 is outside .*write 110u/],
    ['a negative λ', '.model nch nmos lambda=-0.1', /lambda=-0.1 is outside 0 to 10/],
    ['a word that is no parameter', '.model nch nmos level=1 fast', /"fast" is not a parameter/],
  ];
  for (const [what, card, message] of cases) {
    it(what, () => {
      const error = refusal(inverter('nch', 'pmos', card));
      expect(error.line).toBe(5);
      expect(error.message).toMatch(message);
    });
  }

  it('a bad card no device names does not stop the import', () => {
    expect(job(inverter('nmos', 'pmos', '.model spare nmos kp=fast')).netlist.devices).toHaveLength(2);
  });
});

describe('the technology line', () => {
  const text = `* railwise: technology nch pch
${inverter('nch', 'pch', '.model nch nmos (level=1 vto=0.7 kp=110u)\n.model pch pmos (level=1 vto=-0.8 kp=40u lambda=0.2)')}`;

  it("fills the technology's own fields; its devices name no card", () => {
    const { netlist, technology } = job(text);
    expect(technology).toMatchObject({ vtn: 0.7, kpn: 110e-6, vtp: 0.8, kpp: 40e-6, lambdap: 0.2 });
    expect(technology.gamman).toBe(DEFAULT_TECHNOLOGY.gamman);
    expect(technology.models).toBeUndefined();
    expect(netlist.devices.every((d) => d.kind !== 'nmos' || d.model === undefined)).toBe(true);
    expect(technology.source).toMatch(/model cards of cards\.sp/);
  });

  it('refuses a name with no card, and two cards of one type', () => {
    expect(refusal(`* railwise: technology nch\n${inverter('nmos', 'pmos', '')}`).message).toMatch(
      /technology: no \.model card named nch/,
    );
    const twice = `* railwise: technology a b\n${inverter('nmos', 'pmos', '.model a nmos\n.model b nmos')}`;
    expect(refusal(twice).message).toMatch(/two nmos cards/);
  });
});

describe('export → import keeps the level-1 values', () => {
  const tech: Technology = {
    ...DEFAULT_TECHNOLOGY,
    vtn: 0.5,
    gamman: 0.37,
    lambdap: 0.125,
    models: {
      hvt: { type: 'nmos', vt0: 0.65, kp: 98.5e-6 },
      lvt_p: { type: 'pmos', vt0: 0.25, lambda: 0.2 },
    },
  };
  const netlist: Netlist = {
    name: 'inv2',
    devices: [
      { kind: 'pmos', name: 'P1', gate: 'A', drain: 'Y', source: 'VDD', w: 2, l: 0.25, model: 'lvt_p' },
      { kind: 'nmos', name: 'N1', gate: 'A', drain: 'Y', source: 'GND', w: 1, l: 0.25, model: 'hvt' },
      { kind: 'nmos', name: 'N2', gate: 'A', drain: 'Y', source: 'GND', w: 1, l: 0.25 },
    ],
    rails: [
      { net: 'VDD', role: 'supply' },
      { net: 'GND', role: 'ground' },
    ],
    inputs: ['A'],
    outputs: ['Y'],
  };

  it('the technology, the cards and which device names which', () => {
    const text = exportSpice(netlist, tech);
    expect(text).toContain('.model hvt nmos (level=1 vto=0.65 kp=98.5u)');
    expect(text).toContain('.model lvt_p pmos (level=1 vto=-0.25 lambda=0.2)');
    const back = job(text);
    expect(back.netlist.devices.map((d) => d.name)).toEqual(['P1', 'N1', 'N2']);
    expect(
      back.netlist.devices.map((d) => (d.kind === 'nmos' || d.kind === 'pmos' ? d.model : null)),
    ).toEqual(['lvt_p', 'hvt', undefined]);
    // Every value back; only the wording of `source` says where they were read.
    expect({ ...back.technology, source: tech.source }).toEqual(tech);
    expect(back.technology.source).toMatch(/model cards of cards\.sp/);
  });

  it("a technology at the far ends of the design file's ranges still writes cards that read back", () => {
    // The design file admits k' up to 1 A/V², thresholds up to 100 V and 2φF up to 10 V
    // (docs/semantics.md §7); cards written from such a technology are read back, not refused
    // (a fuzzed design with kpn = 0.5 A/V² once exported as kp=500m and failed to open).
    const edge: Technology = {
      ...tech,
      kpn: 0.5,
      kpp: 1e-9,
      vtn: 100,
      phin: 10,
      models: { hvt: { type: 'nmos', vt0: -100, kp: 1 }, lvt_p: { type: 'pmos', phi: 10 } },
    };
    const back = job(exportSpice(netlist, edge));
    expect({ ...back.technology, source: edge.source }).toEqual(edge);
  });

  it('a card that takes the name of the technology card moves the latter aside', () => {
    const clash = { ...tech, models: { rw_nmos: { type: 'nmos' as const, vt0: 0.9 } } };
    const devices = [{ ...(netlist.devices[1] as MosDevice), model: 'rw_nmos' }];
    const text = exportSpice({ ...netlist, devices }, clash);
    expect(text).toContain('* railwise: technology rw_nmos_2 rw_pmos');
    expect(job(text).technology.models).toEqual({ rw_nmos: { type: 'nmos', vt0: 0.9 } });
  });
});
