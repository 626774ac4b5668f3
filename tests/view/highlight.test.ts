import { describe, expect, it } from 'vitest';
import { chainText, findingTargets, splitChain, toSheetTargets } from '../../src/core/view/highlight.ts';
import { pseudoNmosInverter } from './fixtures.ts';

describe('finding highlights', () => {
  // report.ts (docs/semantics.md §3, §5): a current path runs source to ground, nets and devices alternating.
  it('splits a chain into nets and devices', () => {
    expect(splitChain(['VDD', 'P1', 'Y', 'N1', 'GND'])).toEqual({
      nets: ['VDD', 'Y', 'GND'],
      devices: ['P1', 'N1'],
    });
    expect(chainText(['VDD', 'P1', 'Y', 'N1', 'GND'])).toBe('VDD → P1 → Y → N1 → GND');
  });

  it('takes the union of named nets and path members, once each', () => {
    const f = pseudoNmosInverter.findings[0]!;
    expect(findingTargets(f)).toEqual({ nets: ['VDD', 'Y', 'GND'], devices: ['P1', 'N1'] });
  });

  it('maps names to wires and parts, skipping what the sheet does not draw', () => {
    const wires: Record<string, string[]> = { Y: ['w1', 'w2'], VDD: ['w3'], GND: ['w4', 'w1'] };
    const parts: Record<string, string> = { P1: 'p-7', N1: 'p-8' };
    const targets = toSheetTargets(
      { nets: ['VDD', 'Y', 'GND', 'hidden'], devices: ['P1', 'N1', 'R9'] },
      { wiresOfNet: (n) => wires[n] ?? [], partOfDevice: (d) => parts[d] },
    );
    expect(targets).toEqual({ wireIds: ['w3', 'w1', 'w2', 'w4'], partIds: ['p-7', 'p-8'] });
  });
});
