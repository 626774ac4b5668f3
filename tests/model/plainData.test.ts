/** Structural equality of the model's plain data, as the store uses it to keep unchanged netlists. */
import { describe, expect, it } from 'vitest';
import { samePlainData } from '../../src/core/model/plainData.ts';
import { nand2, nand2MissingPullUp } from '../cells.ts';

describe('samePlainData', () => {
  it('finds equal netlists equal and any changed field different', () => {
    expect(samePlainData(nand2, structuredClone(nand2))).toBe(true);
    expect(samePlainData(nand2, nand2MissingPullUp)).toBe(false);
    const wider = { ...nand2, devices: nand2.devices.map((d, i) => (i === 0 ? { ...d, w: 2 } : d)) };
    expect(samePlainData(nand2, wider)).toBe(false);
  });

  it('tells arrays from objects, missing keys from undefined ones, and reads NaN as NaN', () => {
    expect(samePlainData([1, 2], { 0: 1, 1: 2 })).toBe(false);
    expect(samePlainData({ a: undefined }, { b: undefined })).toBe(false);
    expect(samePlainData({ v: Number.NaN }, { v: Number.NaN })).toBe(true);
    expect(samePlainData(null, {})).toBe(false);
    expect(samePlainData('0', 0)).toBe(false);
  });
});
