/**
 * Which scale W and L are read under (docs/semantics.md §6): `--scale` first, then the file's own
 * directive; with neither, plain metres, unless every size in the file is implausible in metres
 * (a centimetre or more, as CDL files that write `w=1.0 l=0.15` in micrometres are): then the file
 * is read in micrometres and a note says so.
 */
import type { SpiceFile } from './spiceParse.ts';
import type { Scale } from './spiceScale.ts';
import { spiceValue } from '../units/spiceNumber.ts';
import { VALUE_RANGES } from './valueRanges.ts';

export function resolveScale(file: SpiceFile, option: number | undefined, notes: string[]): Scale | null {
  if (option !== undefined) {
    if (file.scale !== undefined && file.scale.factor !== option)
      notes.push(
        `--scale ${option} used over the file's ${file.scale.form} ${file.scale.factor} (line ${file.scale.line})`,
      );
    return { factor: option, line: 0, form: '--scale' };
  }
  if (file.scale !== undefined) return file.scale;
  return guessedScale(file, notes);
}

function guessedScale(file: SpiceFile, notes: string[]): Scale | null {
  let first: { text: string; line: number; key: string } | null = null;
  for (const { text, line, key } of sizes(file)) {
    const microns = spiceValue(text, -6);
    if (microns === null || microns < VALUE_RANGES[key].max) return null;
    first ??= { text, line, key };
  }
  if (first === null) return null;
  notes.push(
    `no scale directive, and every W and L reads as 1 cm or more in metres (${first.key.toUpperCase()}=${first.text} on line ${first.line}): read as micrometres, as under ".option scale=1e-6"`,
  );
  return { factor: 1e-6, line: first.line, form: 'guessed' };
}

/** Every W and L written on a transistor line or on an instance of an undefined subcircuit. */
function* sizes(file: SpiceFile): Generator<{ text: string; line: number; key: 'w' | 'l' }> {
  for (const body of [file.top, ...file.subckts]) {
    for (const e of body.elements) {
      const device =
        e.kind === 'mos' || (e.kind === 'instance' && !file.subcktByName.has(e.subckt.toLowerCase()));
      if (!device) continue;
      for (const key of ['w', 'l'] as const) {
        const text = e.params.get(key);
        if (text !== undefined) yield { text, line: e.line, key };
      }
    }
  }
}
