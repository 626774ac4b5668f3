// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest';
import { sheetToSvg } from '../../src/core/sheet/svg.ts';
import { drawnInverter, part } from './fixtures.ts';

describe('SVG export', () => {
  it('is a well-formed SVG document (W3C SVG 1.1 namespace) with every part, wire and junction', () => {
    const sheet = drawnInverter();
    const text = sheetToSvg(sheet);
    const doc = new DOMParser().parseFromString(text, 'image/svg+xml');
    const svg = doc.documentElement;
    expect(svg.tagName.toLowerCase()).toBe('svg');
    expect(svg.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg');
    expect(doc.querySelectorAll('g[data-part]')).toHaveLength(sheet.parts.length);
    // 4 wires, plus the symbols' own polylines.
    expect(text.match(/<polyline/g)!.length).toBeGreaterThanOrEqual(4 + sheet.parts.length);
    expect(doc.querySelectorAll('circle[r="0.2"]')).toHaveLength(2);
    expect([...doc.querySelectorAll('text')].map((t) => t.textContent)).toEqual(
      expect.arrayContaining(['P1', 'N1', 'A', 'Y', 'VDD', 'GND', '2/0.25']),
    );
  });

  it('escapes names so a label cannot break the markup', () => {
    const text = sheetToSvg({ parts: [part('a', 'label', 'a<b&"c', 0, 0)], wires: [] });
    expect(text).toContain('a&lt;b&amp;&quot;c');
    expect(new DOMParser().parseFromString(text, 'image/svg+xml').querySelector('text')!.textContent).toBe(
      'a<b&"c',
    );
  });

  it('sizes the picture to the drawing at the given pixels per grid unit', () => {
    const svg = sheetToSvg(
      {
        parts: [],
        wires: [
          {
            id: 'w',
            points: [
              { x: 0, y: 0 },
              { x: 10, y: 0 },
            ],
          },
        ],
      },
      { scale: 10, margin: 0 },
    );
    // Width: 10 units of drawing + 4 units kept for side text, at 10 px per unit.
    expect(svg).toContain('width="140"');
  });
});
