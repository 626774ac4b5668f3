/**
 * Tells a binary file from text before any reader sees it, so a wrong file (an executable, an
 * archive, a picture) gets one clear line instead of a parser's complaint about its first bytes.
 * The command line and the app refuse such a file alike.
 * Text files never hold NUL characters; a file read as UTF-8 that is mostly U+FFFD was not UTF-8
 * text (common practice, no source).
 */
import { printable } from './printable.ts';

const SAMPLE = 8192;

/** A message refusing a binary file, or null for text. */
export function binaryRefusal(file: string, text: string): string | null {
  const sample = text.slice(0, SAMPLE);
  const replaced = sample.split('\ufffd').length - 1;
  if (!sample.includes('\u0000') && replaced <= sample.length / 10) return null;
  const start = printable(sample.slice(0, 16).replaceAll('\ufffd', '?'));
  return `${file}: not a text file (it holds binary data; it begins "${start}"): give a SPICE netlist or a Railwise design file`;
}
