/**
 * The JSON text of a sweep's rows, exactly as `JSON.stringify(vectorJson(row), null, 2)` writes it,
 * built from the columns without making the row: a 65,536-vector sweep prints hundreds of megabytes,
 * and a plain row (no findings, no current paths, voltages as its levels imply) is nearly all fixed
 * text. Names are quoted once per sweep; a row with detail goes through JSON.stringify as before.
 */
import { levelAt, plainVolts, sweepRow } from '../core/analysis/sweepColumns.ts';
import type { SweepColumns } from '../core/analysis/report.ts';
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
  const indices = setOrder.filter((k) => isIndex(names[k] ?? ''));
  indices.sort((a, b) => Number(names[a]) - Number(names[b]));
  return [...indices, ...setOrder.filter((k) => !isIndex(names[k] ?? ''))];
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
  private readonly vdd: number;
  private lastIndent: string | null = null;
  private pieces: { inner: string; deeper: string } = { inner: '  ', deeper: '    ' };
  /** Member texts at the current indent, by position and level code (4 per net): written once. */
  private outputMembers: string[] = [];
  private voltageMembers: string[] = [];
  /** Member texts of the inputs, by input position and digit. */
  private inputMembers: string[] = [];

  /** Every block of one sweep shares its names, so one writer serves them all. */
  constructor(s: Pick<SweepColumns, 'inputs' | 'nets' | 'outputs' | 'undriven' | 'vdd'>) {
    this.inputKeys = quoted(s.inputs);
    this.netKeys = quoted(s.nets);
    const n = s.inputs.length;
    this.inputOrder = propertyOrder(
      s.inputs,
      Array.from({ length: n }, (_, k) => n - 1 - k),
    );
    const outputNames = Array.from(s.outputs, (j) => s.nets[j] as string);
    this.outputOrder = propertyOrder(outputNames, [...outputNames.keys()]).map((k) => s.outputs[k] as number);
    this.netOrder = propertyOrder(s.nets, [...s.nets.keys()]);
    this.digits = s.undriven ? ['0', '1', '"Z"'] : ['0', '1'];
    this.base = this.digits.length;
    this.vdd = s.vdd;
  }

  /** Row i of a block: its JSON text, lines after the first starting with `indent`. */
  text(s: SweepColumns, i: number, indent: string): string {
    if ((s.detail[i] as number) >= 0) return general(s, i, indent);
    if (indent !== this.lastIndent) this.indentAt(indent);
    const { inner } = this.pieces;
    return (
      `{\n${inner}"inputs": ${this.inputs(s.first + i)},\n${inner}"outputs": ${this.outputs(s, i)},\n` +
      `${inner}"voltages": ${this.voltages(s, i)},\n` +
      `${inner}"supplyCurrent": ${numberText(s.supplyCurrent[i] as number)},\n` +
      `${inner}"staticPower": ${numberText(s.staticPower[i] as number)},\n` +
      `${inner}"currentPaths": [],\n${inner}"findings": []\n${indent}}`
    );
  }

  /** Writes every member text once for rows nested at `indent`. */
  private indentAt(indent: string): void {
    this.lastIndent = indent;
    const deeper = `${indent}    `;
    this.pieces = { inner: `${indent}  `, deeper };
    const codes = [0, 1, 2, 3];
    this.outputMembers = this.netKeys.flatMap((key) =>
      codes.map((code) => `\n${deeper}${key}: "${levelName(code)}"`),
    );
    this.voltageMembers = this.netKeys.flatMap((key) =>
      codes.map((code) => `\n${deeper}${key}: ${numberText(plainVolts(code, this.vdd))}`),
    );
    this.inputMembers = this.inputKeys.flatMap((key) => this.digits.map((d) => `\n${deeper}${key}: ${d}`));
  }

  /** The inputs of vector number k, in the order a sweep's vector names them. */
  private inputs(k: number): string {
    const { base, inputOrder } = this;
    const n = this.inputKeys.length;
    const digit = new Array<number>(n);
    let rest = k;
    for (let p = n - 1; p >= 0; p--) {
      digit[p] = rest % base;
      rest = Math.floor(rest / base);
    }
    return this.object(inputOrder, (p) => this.inputMembers[p * base + (digit[p] as number)] as string);
  }

  private outputs(s: SweepColumns, i: number): string {
    return this.object(this.outputOrder, (j) => this.outputMembers[4 * j + levelAt(s, j, i)] as string);
  }

  private voltages(s: SweepColumns, i: number): string {
    return this.object(this.netOrder, (j) => this.voltageMembers[4 * j + levelAt(s, j, i)] as string);
  }

  /** An object's text at the row's nesting: one member per position, in the order given. */
  private object(order: readonly number[], member: (k: number) => string): string {
    if (order.length === 0) return '{}';
    let out = '{';
    const last = order.length - 1;
    for (let m = 0; m < last; m++) out += `${member(order[m] as number)},`;
    return `${out}${member(order[last] as number)}\n${this.pieces.inner}}`;
  }
}

/** A row with detail: the row built and written by JSON.stringify, re-indented. */
function general(s: SweepColumns, i: number, indent: string): string {
  const json = JSON.stringify(vectorJson(sweepRow(s, i)), null, 2);
  return indent === '' ? json : json.replace(/\n/g, `\n${indent}`);
}
