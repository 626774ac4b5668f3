/**
 * Reads SPICE text into its structure: the top level, the subcircuits, the model cards and the
 * `.global` nets. Problems inside one subcircuit are kept on that subcircuit (so one broken cell of a
 * library never stops the rest); problems with the file's structure throw.
 */
import { ContinuationError, logicalLines, tokens, type LogicalLine } from './spiceLines.ts';
import { ElementError, readElement, WordPool, type Element } from './spiceElements.ts';
import { SpiceImportError } from './spiceErrors.ts';
import { readScale, type Scale } from './spiceScale.ts';

export interface Directive {
  readonly line: number;
  /** Lower-case key: expect, inputs, outputs, supply, ground. */
  readonly key: string;
  readonly value: string;
}

export interface Body {
  readonly elements: Element[];
  readonly directives: Directive[];
  /** The first problem found in this body, if any. */
  error?: SpiceImportError;
}

export interface Subckt extends Body {
  readonly name: string;
  readonly line: number;
  readonly ports: readonly string[];
}

export interface ModelCard {
  /** The name as written. */
  readonly name: string;
  /** Lower-case device type as written: nmos, pmos, d, npn… */
  readonly type: string;
  readonly line: number;
  /** Parameters by lower-case name, values as written (`spiceModels.ts` reads them). */
  readonly params: ReadonlyMap<string, string>;
  /** Words that are not `key=value`: refused only when a device's card is read. */
  readonly stray: readonly string[];
}

export interface SpiceFile {
  readonly top: Body;
  readonly subckts: Subckt[];
  /** By lower-case name. */
  readonly subcktByName: Map<string, Subckt>;
  /** The file's scale directive (`.option scale=`, `.scale`, `*.SCALE`), if any. */
  scale?: Scale;
  /** By lower-case model name. */
  readonly models: Map<string, ModelCard>;
  /** Lower-case names declared by `.global`. */
  readonly globals: Set<string>;
  readonly notes: string[];
}

/** Commands that set up an analysis or output; they do not change the network. */
const ANALYSIS_COMMANDS = new Set([
  '.option',
  '.options',
  '.temp',
  '.tran',
  '.dc',
  '.ac',
  '.op',
  '.print',
  '.plot',
  '.probe',
  '.meas',
  '.measure',
  '.save',
  '.ic',
  '.nodeset',
  '.param',
  '.params',
  '.title',
  '.width',
  '.four',
  '.noise',
]);

interface ParseState {
  readonly file: SpiceFile;
  readonly fileName: string;
  current: Subckt | null;
  /** Line of the `.end` command, once seen. */
  endLine: number | null;
  inControl: boolean;
  readonly pool: WordPool;
}

export function parseSpice(text: string, fileName: string): SpiceFile {
  const file: SpiceFile = {
    top: { elements: [], directives: [] },
    subckts: [],
    subcktByName: new Map(),
    models: new Map(),
    globals: new Set(),
    notes: [],
  };
  const state: ParseState = {
    file,
    fileName,
    current: null,
    endLine: null,
    inControl: false,
    pool: new WordPool(),
  };
  const lines = readLines(text, fileName);
  for (let index = 0, next = lines.next(); !next.done; index++, next = lines.next()) {
    const l = next.value;
    if (state.endLine !== null) {
      file.notes.push(afterEndNote(state.endLine, [l, ...lines]));
      break;
    }
    if (l.kind === 'directive') addDirective(state, l);
    else if (l.kind === 'scale') setScale(state, l.line, l.text, '*.SCALE');
    else if (state.inControl) state.inControl = !/^\.endc\b/i.test(l.text);
    else if (l.text.startsWith('.')) dotCommand(state, l);
    else if (index === 0 && l.line === 1 && isTitle(l.text))
      file.notes.push(`line 1 read as the title: "${l.text}"`);
    else addElement(state, l);
  }
  if (state.current !== null) {
    throw new SpiceImportError(fileName, state.current.line, `.subckt ${state.current.name} has no .ends`);
  }
  return file;
}

/**
 * What follows `.end` is ignored, as SPICE ignores it, but never silently: a note names the lines
 * and any subcircuits defined there (docs/semantics.md §6).
 */
function afterEndNote(endLine: number, rest: readonly LogicalLine[]): string {
  const last = rest[rest.length - 1]?.line ?? endLine;
  const subckts = rest.flatMap((l) => {
    const m = /^\.subckt\s+(\S+)/i.exec(l.text);
    return m ? [m[1] as string] : [];
  });
  const defined =
    subckts.length > 0 ? `, including subcircuits ${subckts.join(', ')}, which are not checked` : '';
  return `lines ${rest[0]?.line ?? endLine}–${last} come after .end (line ${endLine}) and are ignored, as SPICE ignores them${defined}`;
}

function setScale(state: ParseState, line: number, text: string, form: string): void {
  const fail = (detail: string): never => {
    throw new SpiceImportError(state.fileName, line, detail);
  };
  const scale = readScale(text, line, form, fail);
  const before = state.file.scale;
  if (before !== undefined && before.factor !== scale.factor)
    fail(`${form} ${text} contradicts the scale ${before.factor} given on line ${before.line}`);
  state.file.scale = scale;
}

/** The logical lines, read as they are used; a stray `+` line is the file's error, with its line. */
function* readLines(text: string, fileName: string): Generator<LogicalLine> {
  try {
    yield* logicalLines(text);
  } catch (e) {
    if (e instanceof ContinuationError) throw new SpiceImportError(fileName, e.line, e.message);
    throw e;
  }
}

/**
 * Classic SPICE takes the first line as a title; we do so only when it reads as no element (an
 * element whose only fault is a value out of range is an element, refused as such).
 */
function isTitle(text: string): boolean {
  try {
    readElement(text, 1);
    return false;
  } catch (e) {
    return !(e instanceof ElementError && e.outOfRange);
  }
}

function addDirective(state: ParseState, l: LogicalLine): void {
  const m = /^(\S+)\s*(.*)$/.exec(l.text);
  const key = (m?.[1] ?? '').toLowerCase();
  const body = state.current ?? state.file.top;
  body.directives.push({ line: l.line, key, value: (m?.[2] ?? '').trim() });
}

function addElement(state: ParseState, l: LogicalLine): void {
  const body = state.current ?? state.file.top;
  try {
    body.elements.push(readElement(l.text, l.line, state.pool));
  } catch (e) {
    if (!(e instanceof ElementError)) throw e;
    const error = new SpiceImportError(state.fileName, l.line, e.message);
    // At the top level there is no cell to isolate the problem in: the file is unusable.
    if (state.current === null) throw error;
    body.error ??= error;
  }
}

function dotCommand(state: ParseState, l: LogicalLine): void {
  const t = tokens(l.text);
  const command = (t[0] ?? '').toLowerCase();
  const fail = (detail: string): never => {
    throw new SpiceImportError(state.fileName, l.line, detail);
  };
  if (command === '.subckt') return openSubckt(state, t, l.line, fail);
  if (command === '.ends') {
    if (state.current === null) fail('.ends without a .subckt');
    state.current = null;
    return;
  }
  if (command === '.model') return addModel(state, t, l.line, fail);
  if (command === '.global') {
    t.slice(1).forEach((n) => state.file.globals.add(n.toLowerCase()));
    return;
  }
  if (command === '.end') {
    state.endLine = l.line;
    return;
  }
  if (command === '.scale') return setScale(state, l.line, t.slice(1).join(' '), '.scale');
  if (command === '.option' || command === '.options') optionScale(state, t, l.line);
  if (command === '.control') {
    state.inControl = true;
    state.file.notes.push(`line ${l.line}: .control block skipped`);
    return;
  }
  if (command === '.include' || command === '.inc' || command === '.lib') {
    fail(`${command} is not supported: paste the included netlist into this file`);
  }
  if (ANALYSIS_COMMANDS.has(command)) {
    state.file.notes.push(`line ${l.line}: ${command} ignored (it does not change the network)`);
    return;
  }
  fail(`${command} is not a command this reader supports`);
}

function openSubckt(state: ParseState, t: readonly string[], line: number, fail: (d: string) => never): void {
  if (state.current !== null)
    fail(`.subckt inside .subckt ${state.current.name} (line ${state.current.line}) is not supported`);
  const name = t[1];
  if (name === undefined) fail('.subckt needs a name');
  const lower = (name as string).toLowerCase();
  const twin = state.file.subcktByName.get(lower);
  if (twin !== undefined) fail(`subcircuit ${name} is already defined on line ${twin.line}`);
  const rest = t.slice(2).filter((p) => !/^params:$/i.test(p));
  const ports = rest.filter((p) => !p.includes('='));
  if (ports.length < rest.length)
    state.file.notes.push(`line ${line}: parameters of .subckt ${name} ignored`);
  const sub: Subckt = { name: name as string, line, ports, elements: [], directives: [] };
  // A port named twice would make one net two pins: this cell cannot be read, the others still can.
  const seen = new Set<string>();
  const twice = ports.find((p) => seen.size === seen.add(p.toLowerCase()).size);
  if (twice !== undefined)
    sub.error = new SpiceImportError(state.fileName, line, `.subckt ${name}: port ${twice} is listed twice`);
  state.file.subckts.push(sub);
  state.file.subcktByName.set(lower, sub);
  state.current = sub;
}

/**
 * `.model NAME TYPE (key=value …)`: parentheses and commas are optional, as `tokens` reads them. A
 * name given twice keeps its later card, as the last definition wins in SPICE decks; a note says so.
 */
function addModel(state: ParseState, t: readonly string[], line: number, fail: (d: string) => never): void {
  const [, name, type, ...rest] = t;
  if (name === undefined || type === undefined) fail('.model needs a name and a type');
  const params = new Map<string, string>();
  const stray: string[] = [];
  for (const item of rest) {
    const eq = item.indexOf('=');
    if (eq > 0) params.set(item.slice(0, eq).toLowerCase(), item.slice(eq + 1));
    else stray.push(item);
  }
  const key = (name as string).toLowerCase();
  const before = state.file.models.get(key);
  if (before !== undefined)
    state.file.notes.push(
      `line ${line}: .model ${name} given again (first on line ${before.line}); this card is used`,
    );
  const card = { name: name as string, type: (type as string).toLowerCase(), line, params, stray };
  state.file.models.set(key, card);
}

/** `.option scale=1e-6` (other options stay ignored, with the note every analysis command gets). */
function optionScale(state: ParseState, t: readonly string[], line: number): void {
  for (const option of t.slice(1)) {
    const m = /^scale=(.*)$/i.exec(option);
    if (m) setScale(state, line, m[1] ?? '', '.option scale=');
  }
}
