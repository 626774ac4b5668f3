/**
 * Text drawn with parts. Sizes are in grid units; the canvas and the SVG export both place a line
 * by the middle of its height, so they agree on where text sits.
 */
import type { Point } from '../position.ts';
import { toWorld, type Placement } from '../placement.ts';
import type { PartText } from './spec.ts';

export const TEXT_SIZE: Readonly<Record<PartText['style'], number>> = { name: 0.75, value: 0.6, net: 0.75 };

/** From the name's middle to the value line's middle: its top sits 0.6 name-heights lower. */
const VALUE_DROP = TEXT_SIZE.name * 0.6 + TEXT_SIZE.value / 2;

/**
 * The usual layout: the name at `at` (local units, left-aligned and upright whatever the turn) and
 * the value line under it.
 */
export function nameAndValue<P extends Placement & { readonly name: string }>(
  at: Point,
  valueLabel: (part: P) => string,
): (part: P) => PartText[] {
  return (part) => {
    const w = toWorld(part, at);
    const value = valueLabel(part);
    const texts: PartText[] = [];
    if (part.name !== '') texts.push({ text: part.name, x: w.x, y: w.y, align: 'start', style: 'name' });
    if (value !== '')
      texts.push({ text: value, x: w.x, y: w.y + VALUE_DROP, align: 'start', style: 'value' });
    return texts;
  };
}

/** For kinds with no size to show. */
export function noValue(): string {
  return '';
}
