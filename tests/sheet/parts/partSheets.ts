/**
 * Helpers for the part spec tests: one part alone on a sheet, and what the netlist, the SVG export
 * and the canvas text make of it.
 */
import { sheetToNetlist } from '../../../src/core/sheet/toNetlist.ts';
import { sheetToSvg } from '../../../src/core/sheet/svg.ts';
import { partSpec } from '../../../src/core/sheet/parts/index.ts';
import type { SheetPart } from '../../../src/core/sheet/types.ts';

/** The devices a lone part contributes; its unconnected pins get net1, net2, … in pin order. */
export function devicesOf(part: SheetPart) {
  return sheetToNetlist({ parts: [part], wires: [] }).netlist.devices;
}

/** The text lines of the part in the SVG export, in order. */
export function svgTexts(part: SheetPart): string[] {
  const svg = sheetToSvg({ parts: [part], wires: [] });
  return [...svg.matchAll(/<text [^>]*>([^<]*)<\/text>/g)].map((m) => m[1]!);
}

/** The text lines the canvas draws for the part (the spec's layout). */
export function canvasTexts(part: SheetPart): string[] {
  return partSpec(part.kind)
    .texts(part)
    .map((t) => t.text);
}
