/**
 * Rails, pins and net labels: they name nets and contribute no device. Our own rules (no published
 * source applies), except the rail names VDD and GND, the trade's usual names (common practice).
 */
import { describe, expect, it } from 'vitest';
import { partSpec } from '../../../src/core/sheet/parts/index.ts';
import { nextPartName } from '../../../src/core/sheet/naming.ts';
import { sheetToNetlist } from '../../../src/core/sheet/toNetlist.ts';
import { part } from '../fixtures.ts';
import { canvasTexts, svgTexts } from './partSheets.ts';

const NAMING = ['vdd', 'gnd', 'input', 'output', 'label'] as const;

describe('naming parts', () => {
  it.each(NAMING)('%s has no fields, no size and no device', (kind) => {
    const spec = partSpec(kind);
    expect(spec.fields).toEqual([]);
    expect(spec.defaults).toEqual({});
    expect(spec.valueLabel(part('p', kind, 'X1', 0, 0))).toBe('');
    expect(sheetToNetlist({ parts: [part('p', kind, 'X1', 0, 0)], wires: [] }).netlist.devices).toEqual([]);
  });

  it('give their net its name and role', () => {
    const parts = NAMING.map((kind, i) => part(`p${i}`, kind, `n${i}`, i * 10, 0));
    const { netlist } = sheetToNetlist({ parts, wires: [] });
    expect(netlist.rails).toEqual([
      { net: 'n0', role: 'supply' },
      { net: 'n1', role: 'ground' },
    ]);
    expect(netlist.inputs).toEqual(['n2']);
    expect(netlist.outputs).toEqual(['n3']);
  });

  it('are named by their rule: rails by their one name, pins by letters, labels by number', () => {
    const empty = { parts: [], wires: [] };
    expect(nextPartName(empty, 'vdd')).toBe('VDD');
    expect(nextPartName(empty, 'gnd')).toBe('GND');
    expect(nextPartName({ parts: [part('a', 'input', 'A', 0, 0)], wires: [] }, 'input')).toBe('B');
    expect(nextPartName(empty, 'output')).toBe('Y');
    expect(nextPartName({ parts: [part('l', 'label', 'net4', 0, 0)], wires: [] }, 'label')).toBe('net5');
  });

  it('write the net name as text, the same on the canvas and in the SVG export', () => {
    for (const kind of NAMING) {
      const p = part('p', kind, 'BL', 0, 0);
      expect(canvasTexts(p)).toEqual(['BL']);
      expect(svgTexts(p)).toEqual(['BL']);
    }
  });

  it("place a net label's text beyond its flag, on the side it points to", () => {
    const at = (rotation: 0 | 1 | 2 | 3) =>
      partSpec('label').texts(part('l', 'label', 'BL', 10, 20, { rotation }));
    expect(at(0)).toEqual([{ text: 'BL', x: 11.4, y: 20, align: 'start', style: 'net' }]);
    expect(at(2)).toEqual([{ text: 'BL', x: 8.6, y: 20, align: 'end', style: 'net' }]);
    expect(at(1)[0]).toMatchObject({ x: 10, align: 'middle' });
    expect(at(1)[0]!.y).toBeGreaterThan(21.4);
    expect(at(3)[0]!.y).toBeLessThan(18.6);
  });
});
