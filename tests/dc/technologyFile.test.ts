/**
 * The level-1 parameters in design files: files written before they existed still open (with the
 * textbook defaults), and a design's own values survive a save and a load.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { DesignFileError, parseDesignFile, serializeDesign } from '../../src/core/format/designFile.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';

const EXAMPLE = 'public/examples/lamp-inverter.railwise.json';

describe('level-1 parameters in the design file', () => {
  it('a file without them takes the RCN 0.25 µm defaults', () => {
    const text = readFileSync(EXAMPLE, 'utf8');
    expect(text).not.toMatch(/gamman|lambdan/);
    const { technology } = parseDesignFile(text, EXAMPLE);
    expect(technology.gamman).toBe(0.4);
    expect(technology.gammap).toBe(0.4);
    expect(technology.phin).toBe(0.6);
    expect(technology.phip).toBe(0.6);
    expect(technology.lambdan).toBe(0.06);
    expect(technology.lambdap).toBe(0.1);
  });
  it("a design's own values round-trip", () => {
    const design = parseDesignFile(readFileSync(EXAMPLE, 'utf8'), EXAMPLE);
    const own = {
      ...design,
      technology: { ...DEFAULT_TECHNOLOGY, gamman: 0.5, phin: 0.8, lambdan: 0, lambdap: 0.2 },
    };
    const again = parseDesignFile(serializeDesign(own), 'again.json');
    expect(again.technology).toEqual(own.technology);
  });
  it('a negative λ is refused, naming the field', () => {
    const file = JSON.parse(readFileSync(EXAMPLE, 'utf8')) as { technology: Record<string, unknown> };
    file.technology = { ...file.technology, lambdan: -0.1 };
    let error: unknown;
    try {
      parseDesignFile(JSON.stringify(file), 'bad.json');
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(DesignFileError);
    expect((error as DesignFileError).field).toBe('technology.lambdan');
  });
});

describe('model cards in the design file', () => {
  const base = (): { technology: Record<string, unknown>; netlist: { devices: Record<string, unknown>[] } } =>
    JSON.parse(readFileSync(EXAMPLE, 'utf8')) as never;
  const withCards = () => {
    const file = base();
    file.technology = { ...file.technology, models: { hvt: { type: 'nmos', vt0: 0.6, kp: 90e-6 } } };
    const nmos = file.netlist.devices.findIndex((d) => d['kind'] === 'nmos');
    file.netlist.devices[nmos] = { ...file.netlist.devices[nmos], model: 'hvt' };
    return { file, nmos };
  };
  const refusal = (file: unknown): DesignFileError => {
    try {
      parseDesignFile(JSON.stringify(file), 'cards.json');
    } catch (e) {
      if (e instanceof DesignFileError) return e;
      throw e;
    }
    throw new Error('expected a DesignFileError');
  };

  it('a file without cards loads with none', () => {
    expect(parseDesignFile(readFileSync(EXAMPLE, 'utf8'), EXAMPLE).technology.models).toBeUndefined();
  });

  it('cards and the devices that name them round-trip', () => {
    const { file, nmos } = withCards();
    const design = parseDesignFile(JSON.stringify(file), 'cards.json');
    expect(design.technology.models).toEqual({ hvt: { type: 'nmos', vt0: 0.6, kp: 90e-6 } });
    expect(design.cells[0]?.netlist.devices[nmos]).toMatchObject({ model: 'hvt' });
    expect(parseDesignFile(serializeDesign(design), 'again.json')).toEqual(design);
  });

  it('a device naming a card the technology lacks is refused, naming the field', () => {
    const { file, nmos } = withCards();
    file.technology = { ...file.technology, models: {} };
    const error = refusal(file);
    expect(error.field).toBe(`netlist.devices[${nmos}].model`);
    expect(error.message).toMatch(/no model card 'hvt'/);
  });

  it('a PMOS card named by an NMOS is refused', () => {
    const { file } = withCards();
    file.technology = { ...file.technology, models: { hvt: { type: 'pmos' } } };
    expect(refusal(file).message).toMatch(/'hvt' is a pmos card, not nmos/);
  });

  it("'constructor' is no card", () => {
    const { file, nmos } = withCards();
    file.netlist.devices[nmos] = { ...file.netlist.devices[nmos], model: 'constructor' };
    expect(refusal(file).field).toBe(`netlist.devices[${nmos}].model`);
  });
});
