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

/**
 * Words a file repeats (net names, model names, parameter lists), kept once per file: a netlist of a
 * million transistors names each net several times, and each copy would otherwise stay in memory
 * with the element that read it.
 */
const SHARED_PARAM_LISTS = 4096;

export class WordPool {
  private readonly words = new Map<string, string>();
  private readonly params = new Map<string, ReadonlyMap<string, string>>();

  word(text: string): string {
    const known = this.words.get(text);
    if (known !== undefined) return known;
    this.words.set(text, text);
    return text;
  }

  /**
   * One map for every element that gives the same parameters in the same order. Past a few
   * thousand different lists (every device sized apart) sharing saves little: new ones are not kept.
   */
  paramMap(key: string, make: () => ReadonlyMap<string, string>): ReadonlyMap<string, string> {
    const known = this.params.get(key);
    if (known !== undefined) return known;
    const made = make();
    if (this.params.size < SHARED_PARAM_LISTS) this.params.set(key, made);
    return made;
  }
}

export function readElement(text: string, line: number, pool: WordPool = new WordPool()): Element {
  const t = tokens(text);
  const name = t[0] ?? '';
  const letter = name.charAt(0).toLowerCase();
  const args = t.slice(1).map((w) => (w.includes('=') ? w : pool.word(w)));
  switch (letter) {
    case 'm':
      return readMos(name, args, line, pool);
    case 'r':
    case 'c':
      return readPassive(letter === 'r' ? 'resistor' : 'capacitor', name, args, line, pool);
    case 'd':
      return readDiode(name, args, line, pool);
    case 'v':
      return readSource(name, args, text, line);
    case 'x':
      return readInstance(name, args, line, pool);
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

/** No parameters: one map for every element that gives none. */
const NO_PARAMS: ReadonlyMap<string, string> = new Map();

/**
 * Splits `a b c k=v` into positional tokens and a parameter map; parameters may not come first.
 * Elements that give the same parameters share one map (it is never changed once read).
 */
function splitParams(
  args: readonly string[],
  pool: WordPool,
): { positional: string[]; params: ReadonlyMap<string, string> } {
  const at = args.findIndex((a) => a.includes('='));
  if (at < 0) return { positional: [...args], params: NO_PARAMS };
  const given = args.slice(at);
  return { positional: args.slice(0, at), params: pool.paramMap(given.join(' '), () => paramMap(given)) };
}

function paramMap(given: readonly string[]): ReadonlyMap<string, string> {
  const params = new Map<string, string>();
  for (const a of given) {
    const eq = a.indexOf('=');
    if (eq < 0) throw new ElementError(`"${a}" follows a parameter; nets and the model come first`);
    const key = a.slice(0, eq).toLowerCase();
    const value = a.slice(eq + 1);
    if (/^['"{]/.test(value))
      throw new ElementError(`parameter ${key}=${value}: expressions are not supported, give a number`);
    params.set(key, value);
  }
  return params;
}

/** Built field by field, never by spreading: V8 gives every spread copy a hidden class of its own. */
function readMos(name: string, args: readonly string[], line: number, pool: WordPool): MosElement {
  const { positional, params } = splitParams(args, pool);
  if (positional.length !== 4 && positional.length !== 5) {
    throw new ElementError(`${name}: a MOS line needs drain, gate, source, bulk and a model name`);
  }
  const model = positional[positional.length - 1] as string;
  const [drain = '', gate = '', source = '', bulk] = positional;
  return positional.length === 5 && bulk !== undefined
    ? { kind: 'mos', name, line, drain, gate, source, model, params, bulk }
    : { kind: 'mos', name, line, drain, gate, source, model, params };
}

function readPassive(
  kind: 'resistor' | 'capacitor',
  name: string,
  args: readonly string[],
  line: number,
  pool: WordPool,
): PassiveElement | ShortElement {
  const { positional, params } = splitParams(args, pool);
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

function readDiode(name: string, args: readonly string[], line: number, pool: WordPool): DiodeElement {
  const { positional } = splitParams(args, pool);
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

function readInstance(name: string, args: readonly string[], line: number, pool: WordPool): InstanceElement {
  // CDL writes a lone `/` between the nets and the subcircuit name: `X1 A Y / inv`.
  const { positional, params } = splitParams(
    args.filter((a) => a !== '/'),
    pool,
  );
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
