/**
 * The JSON text of a sweep's rows, exactly as `JSON.stringify(vectorJson(row), null, 2)` writes it,
 * built from the columns without making the row: a 65,536-vector sweep prints hundreds of megabytes,
 * and a plain row (no findings, no current paths, voltages as its levels imply) is nearly all fixed
 * text. Names are quoted once per sweep; a row with detail goes through JSON.stringify as before.
 */
import { levelAt, plainVolts, sweepRow, type SweepColumns } from '../core/analysis/sweepColumns.ts';
import { levelName } from '../core/solver/levels.ts';
import { vectorJson } from './runCell.ts';

/** JSON of a number as JSON.stringify writes it: NaN and infinities are null. */
function numberText(n: number): string {
  return Number.isFinite(n) ? String(n) : 'null';
}

/** Keys quoted once, as JSON.stringify quotes them. */
function quoted(names: readonly string[]): string[] {
  return names.map((n) => JSON.stringify(n));
}

/** A name JavaScript treats as an array index: such keys come first in an object, in numeric order. */
function isIndex(name: string): boolean {
  return /^(0|[1-9][0-9]*)$/.test(name) && Number(name) < 4294967295;
}

/**
 * Positions of `names` (in the order they were set) in the order an object lists them: array
 * indices first, ascending, then the rest as set (ECMA-262, OrdinaryOwnPropertyKeys).
 */
export function propertyOrder(names: readonly string[], setOrder: readonly number[]): number[] {
  const indices = setOrder.filter((k) => isIndex(names[k]));
  indices.sort((a, b) => Number(names[a]) - Number(names[b]));
  return [...indices, ...setOrder.filter((k) => !isIndex(names[k]))];
}

export class SweepRowText {
  private readonly inputKeys: string[];
  private readonly netKeys: string[];
  /** Positions in the order each object prints them. */
  private readonly inputOrder: number[];
  private readonly outputOrder: number[];
  private readonly netOrder: number[];
  private readonly digits: string[];
  private readonly base: number;
  private lastIndent = '';
  private pieces: { inner: string; deeper: string } = { inner: '  ', deeper: '    ' };

  /** Every block of one sweep shares its names, so one writer serves them all. */
  constructor(s: Pick<SweepColumns, 'inputs' | 'nets' | 'outputs' | 'undriven'>) {
    this.inputKeys = quoted(s.inputs);
    this.netKeys = quoted(s.nets);
    const n = s.inputs.length;
    this.inputOrder = propertyOrder(
      s.inputs,
      Array.from({ length: n }, (_, k) => n - 1 - k),
    );
    const outputNames = Array.from(s.outputs, (j) => s.nets[j]);
    this.outputOrder = propertyOrder(outputNames, [...outputNames.keys()]).map((k) => s.outputs[k]);
    this.netOrder = propertyOrder(s.nets, [...s.nets.keys()]);
    this.digits = s.undriven ? ['0', '1', '"Z"'] : ['0', '1'];
    this.base = this.digits.length;
  }

  /** Row i of a block: its JSON text, lines after the first starting with `indent`. */
  text(s: SweepColumns, i: number, indent: string): string {
    if (s.detail[i] >= 0) return general(s, i, indent);
    if (indent !== this.lastIndent) {
      this.lastIndent = indent;
      this.pieces = { inner: `${indent}  `, deeper: `${indent}    ` };
    }
    const { inner } = this.pieces;
    return (
      `{\n${inner}"inputs": ${this.inputs(s.first + i)},\n${inner}"outputs": ${this.outputs(s, i)},\n` +
      `${inner}"voltages": ${this.voltages(s, i)},\n` +
      `${inner}"supplyCurrent": ${numberText(s.supplyCurrent[i])},\n` +
      `${inner}"staticPower": ${numberText(s.staticPower[i])},\n` +
      `${inner}"currentPaths": [],\n${inner}"findings": []\n${indent}}`
    );
  }

  /** The inputs of vector number k, in the order a sweep's vector names them. */
  private inputs(k: number): string {
    const keys = this.inputKeys;
    const values = new Array<string>(keys.length);
    let rest = k;
    for (let k = keys.length - 1; k >= 0; k--) {
      values[k] = this.digits[rest % this.base];
      rest = Math.floor(rest / this.base);
    }
    return this.object(this.inputOrder, (k) => `${keys[k]}: ${values[k]}`);
  }

  private outputs(s: SweepColumns, i: number): string {
    return this.object(this.outputOrder, (j) => `${this.netKeys[j]}: "${levelName(levelAt(s, j, i))}"`);
  }

  private voltages(s: SweepColumns, i: number): string {
    return this.object(
      this.netOrder,
      (j) => `${this.netKeys[j]}: ${numberText(plainVolts(levelAt(s, j, i), s.vdd))}`,
    );
  }

  /** An object's text at the row's nesting: one member per position, in the order given. */
  private object(order: readonly number[], member: (k: number) => string): string {
    if (order.length === 0) return '{}';
    const { inner, deeper } = this.pieces;
    let out = '{';
    for (let m = 0; m < order.length; m++)
      out += `\n${deeper}${member(order[m])}${m + 1 < order.length ? ',' : ''}`;
    return `${out}\n${inner}}`;
  }
}

/** A row with detail: the row built and written by JSON.stringify, re-indented. */
function general(s: SweepColumns, i: number, indent: string): string {
  const json = JSON.stringify(vectorJson(sweepRow(s, i)), null, 2);
  return indent === '' ? json : json.replace(/\n/g, `\n${indent}`);
}
