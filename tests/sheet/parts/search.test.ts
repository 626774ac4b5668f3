// Unit tests of our own plumbing (the shelf's search): no published source applies.
import { describe, expect, it } from 'vitest';
import { findPartKinds } from '../../../src/core/sheet/parts/search.ts';
import { SHELF_KINDS } from '../../../src/core/sheet/parts/index.ts';

describe('finding a part kind by name', () => {
  it('matches the beginning of any word of the title, the kind or its search words', () => {
    expect(findPartKinds('res')).toEqual(['resistor']);
    expect(findPartKinds('ground')).toEqual(['gnd']);
    expect(findPartKinds('supply')).toEqual(['vdd']);
    expect(findPartKinds('n-ch')).toEqual(['nmos']);
    expect(findPartKinds('PMOS')).toEqual(['pmos']);
  });

  it('puts kinds whose title begins with the text first, the rest in shelf order', () => {
    const p = findPartKinds('p');
    expect(p[0]).toBe('pmos');
    expect(p).toEqual(expect.arrayContaining(['input', 'output']));
    expect(findPartKinds('pin')).toEqual(['input', 'output']);
  });

  it('needs every typed word to match, and finds nothing for an unknown name', () => {
    expect(findPartKinds('output pin')).toEqual(['output']);
    expect(findPartKinds('transistor')).toEqual(['nmos', 'pmos']);
    expect(findPartKinds('inductor')).toEqual([]);
  });

  it('offers every kind for an empty text', () => {
    expect(findPartKinds('  ')).toEqual(SHELF_KINDS);
  });
});
