/**
 * Reads one element statement (`M…`, `R…`, `C…`, `D…`, `V…`, `X…`) into a plain record. Values stay
 * as written where the unit depends on context (MOS W and L are converted when the cell is built);
 * anything this reader does not understand throws with the line number.
 */
import { spiceValue } from '../units/spiceNumber.ts';
import { tokens } from './spiceLines.ts';
import { rangeProblem, type RangedField } from './valueRanges.ts';

interface Located {
  readonly name: string;
  readonly line: number;
}

export interface MosElement extends Located {
  readonly kind: 'mos';
  readonly drain: string;
  readonly gate: string;
  readonly source: string;
  readonly bulk?: string;
  readonly model: string;
  /** Instance parameters by lower-case name, values as written. */
  readonly params: ReadonlyMap<string, string>;
}

export interface PassiveElement extends Located {
  readonly kind: 'resistor' | 'capacitor';
  readonly a: string;
  readonly b: string;
  /** Ohms or farads. */
  readonly value: number;
}

/** A CDL resistor whose value is the word `short`: a zero-ohm connection. */
export interface ShortElement extends Located {
  readonly kind: 'short';
  readonly a: string;
  readonly b: string;
}

export interface DiodeElement extends Located {
  readonly kind: 'diode';
  readonly anode: string;
  readonly cathode: string;
}

export interface SourceElement extends Located {
  readonly kind: 'source';
  readonly plus: string;
  readonly minus: string;
  readonly volts: number;
}

export interface InstanceElement extends Located {
  readonly kind: 'instance';
  readonly nets: readonly string[];
  readonly subckt: string;
  /** Parameters given on the instance by lower-case name, values as written. */
  readonly params: ReadonlyMap<string, string>;
}

export type Element =
  MosElement | PassiveElement | ShortElement | DiodeElement | SourceElement | InstanceElement;

/** Thrown by the element readers; the caller adds the file name. */
export class ElementError extends Error {
  override readonly name = 'ElementError';
  /** True when the line reads as an element and only a value is out of its range. */
  outOfRange = false;
}

const UNSUPPORTED: Readonly<Record<string, string>> = {
  b: 'behavioural source',
  e: 'voltage-controlled voltage source',
  f: 'current-controlled current source',
  g: 'voltage-controlled current source',
  h: 'current-controlled voltage source',
  i: 'current source',
  j: 'JFET',
  k: 'coupled inductors',
  l: 'inductor',
  o: 'lossy transmission line',
  q: 'bipolar transistor',
  s: 'voltage-controlled switch',
  t: 'transmission line',
  u: 'distributed RC line',
  w: 'current-controlled switch',
  y: 'transmission line',
  z: 'MESFET',
};

export function readElement(text: string, line: number): Element {
  const t = tokens(text);
  const name = t[0] ?? '';
  const letter = name.charAt(0).toLowerCase();
  switch (letter) {
    case 'm':
      return readMos(name, t.slice(1), line);
    case 'r':
    case 'c':
      return readPassive(letter === 'r' ? 'resistor' : 'capacitor', name, t.slice(1), line);
    case 'd':
      return readDiode(name, t.slice(1), line);
    case 'v':
      return readSource(name, t.slice(1), text, line);
    case 'x':
      return readInstance(name, t.slice(1), line);
    default: {
      const what = UNSUPPORTED[letter];
      throw new ElementError(
        what === undefined
          ? `"${name}" is not an element this reader knows (M, R, C, D, V and X lines are supported)`
          : `${name}: ${what}s are not supported (M, R, C, D, V and X lines are)`,
      );
    }
  }
}

/** Splits `a b c k=v` into positional tokens and a parameter map; parameters may not come first. */
function splitParams(args: readonly string[]): { positional: string[]; params: Map<string, string> } {
  const positional: string[] = [];
  const params = new Map<string, string>();
  for (const a of args) {
    const eq = a.indexOf('=');
    if (eq < 0) {
      if (params.size > 0)
        throw new ElementError(`"${a}" follows a parameter; nets and the model come first`);
      positional.push(a);
    } else {
      const key = a.slice(0, eq).toLowerCase();
      const value = a.slice(eq + 1);
      if (/^['"{]/.test(value))
        throw new ElementError(`parameter ${key}=${value}: expressions are not supported, give a number`);
      params.set(key, value);
    }
  }
  return { positional, params };
}

function readMos(name: string, args: readonly string[], line: number): MosElement {
  const { positional, params } = splitParams(args);
  if (positional.length !== 4 && positional.length !== 5) {
    throw new ElementError(`${name}: a MOS line needs drain, gate, source, bulk and a model name`);
  }
  const model = positional[positional.length - 1] as string;
  const [drain = '', gate = '', source = '', bulk] = positional;
  const base = { kind: 'mos' as const, name, line, drain, gate, source, model, params };
  return positional.length === 5 && bulk !== undefined ? { ...base, bulk } : base;
}

function readPassive(
  kind: 'resistor' | 'capacitor',
  name: string,
  args: readonly string[],
  line: number,
): PassiveElement | ShortElement {
  const { positional, params } = splitParams(args);
  const [a, b, valueText = params.get(kind === 'resistor' ? 'r' : 'c')] = positional;
  const unit = kind === 'resistor' ? 'resistance in ohms' : 'capacitance in farads';
  if (a === undefined || b === undefined || valueText === undefined) {
    throw new ElementError(`${name}: needs two nets and a ${unit}`);
  }
  if (kind === 'resistor' && valueText.toLowerCase() === 'short') return { kind: 'short', name, line, a, b };
  const value = spiceValue(valueText);
  if (value === null || !(value > 0))
    throw new ElementError(`${name}: "${valueText}" is not a positive ${unit}`);
  return {
    kind,
    name,
    line,
    a,
    b,
    value: inRange(name, kind === 'resistor' ? 'ohms' : 'farads', valueText, value),
  };
}

/** The value, or an error naming the element, the field and the documented range. */
export function inRange(name: string, field: RangedField, text: string, value: number): number {
  const problem = rangeProblem(field, value);
  if (problem === null) return value;
  const error = new ElementError(`${name}: ${field} ${text} ${problem}`);
  error.outOfRange = true;
  throw error;
}

function readDiode(name: string, args: readonly string[], line: number): DiodeElement {
  const { positional } = splitParams(args);
  const [anode, cathode] = positional;
  if (anode === undefined || cathode === undefined)
    throw new ElementError(`${name}: needs an anode and a cathode net`);
  return { kind: 'diode', name, line, anode, cathode };
}

/** `Vname plus minus [DC] value`: only constant sources; a time-varying one cannot be a rail. */
function readSource(name: string, args: readonly string[], text: string, line: number): SourceElement {
  if (/\b(pulse|pwl|sin|exp|sffm|am)\s*\(/i.test(text)) {
    throw new ElementError(
      `${name}: time-varying sources are not supported; declare the net as an input instead`,
    );
  }
  const [plus, minus, ...rest] = args;
  const valueTokens = rest.filter((r) => !/^dc$/i.test(r));
  const first = valueTokens[0] ?? '0';
  const volts = spiceValue(first.replace(/^dc=/i, ''));
  if (plus === undefined || minus === undefined || volts === null) {
    throw new ElementError(`${name}: a V line needs two nets and a DC voltage`);
  }
  if (Math.abs(volts) > 0) inRange(name, 'volts', first, Math.abs(volts));
  return { kind: 'source', name, line, plus, minus, volts };
}

function readInstance(name: string, args: readonly string[], line: number): InstanceElement {
  // CDL writes a lone `/` between the nets and the subcircuit name: `X1 A Y / inv`.
  const { positional, params } = splitParams(args.filter((a) => a !== '/'));
  const subckt = positional[positional.length - 1];
  if (subckt === undefined) throw new ElementError(`${name}: an X line needs its nets and a subcircuit name`);
  return {
    kind: 'instance',
    name,
    line,
    nets: positional.slice(0, -1),
    subckt,
    params,
  };
}
