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
