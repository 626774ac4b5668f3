// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import { printable } from '../format/printable.ts';

/**
 * Expected functions (docs/semantics.md §4): `!` `&` `|` `^`, parentheses, constants 0 and 1, `S ? A : B`, and `Z`
 * as a result (tristate outputs). Precedence from loosest: `?:` (right-associative), `|`, `^`, `&`, `!`.
 */
export type Expr =
  | { readonly kind: 'const'; readonly value: '0' | '1' | 'Z' }
  | { readonly kind: 'name'; readonly name: string; readonly at: number }
  | { readonly kind: 'not'; readonly arg: Expr }
  | { readonly kind: 'and' | 'or' | 'xor'; readonly left: Expr; readonly right: Expr }
  | { readonly kind: 'choose'; readonly select: Expr; readonly whenTrue: Expr; readonly whenFalse: Expr };

/**
 * How deep an expression may nest: parentheses and `?:` branches while parsing, and the operator
 * tree once built. Chains of one operator (`A & B & C …`) are built as balanced trees and runs of `!`
 * are folded, so only real nesting counts. The bound keeps every walk of the tree (parsing, checking
 * names, evaluating) far inside the JavaScript stack.
 */
export const MAX_EXPRESSION_DEPTH = 256;

/** A bad expression; `position` is the 0-based column of the offending token in `source`. */
export class ExpressionError extends Error {
  override readonly name = 'ExpressionError';
  constructor(
    /** What is wrong, without the place. */
    readonly detail: string,
    readonly source: string,
    readonly position: number,
    /** The output whose expected function this is, when known. */
    readonly output?: string,
  ) {
    const whose = output === undefined ? '' : `${printable(output)}: `;
    super(`${whose}${detail} at column ${position + 1} of "${excerpt(source, position)}"`);
  }
}

/** At most about 60 characters of the source around `position`, control characters escaped. */
function excerpt(source: string, position: number): string {
  const from = Math.max(0, Math.min(position - 30, source.length - 60));
  const to = Math.min(source.length, from + 60);
  const text = printable(source.slice(from, to));
  return `${from > 0 ? '…' : ''}${text}${to < source.length ? '…' : ''}`;
}

interface Token {
  readonly text: string;
  readonly at: number;
}

const NAME = /[A-Za-z_][A-Za-z0-9_.[\]<>:#/-]*/y;
const SYMBOLS = '!&|^()?:01';

function tokenize(source: string): Token[] {
  const tokens: Token[] = [];
  let i = 0;
  while (i < source.length) {
    const ch = source[i]!;
    if (/\s/.test(ch)) {
      i++;
      continue;
    }
    NAME.lastIndex = i;
    const m = NAME.exec(source);
    if (m) {
      tokens.push({ text: m[0], at: i });
      i += m[0].length;
    } else if (SYMBOLS.includes(ch)) {
      tokens.push({ text: ch, at: i++ });
    } else {
      throw new ExpressionError(`unexpected character '${printable(ch)}'`, source, i);
    }
  }
  return tokens;
}

/** Depth of each node built, so the tree's depth is known without walking it. */
type Built = { readonly expr: Expr; readonly depth: number };

class Parser {
  private i = 0;
  constructor(
    private readonly source: string,
    private readonly tokens: Token[],
    private readonly inputs: ReadonlySet<string>,
  ) {}

  parseAll(): Expr {
    if (this.tokens.length === 0) throw new ExpressionError('empty expression', this.source, 0);
    const e = this.choose(0);
    const extra = this.tokens[this.i];
    if (extra) throw new ExpressionError(`unexpected '${extra.text}'`, this.source, extra.at);
    return e.expr;
  }

  private peek(): Token | undefined {
    return this.tokens[this.i];
  }

  private take(text: string): boolean {
    if (this.peek()?.text !== text) return false;
    this.i++;
    return true;
  }

  /** `nesting` counts the parentheses and `?:` branches around this point. */
  private choose(nesting: number): Built {
    if (nesting > MAX_EXPRESSION_DEPTH) this.fail(`nested more than ${MAX_EXPRESSION_DEPTH} levels deep`);
    const select = this.binary(0, nesting);
    if (!this.take('?')) return select;
    const whenTrue = this.choose(nesting + 1);
    if (!this.take(':')) this.fail("expected ':'");
    const whenFalse = this.choose(nesting + 1);
    const expr: Expr = {
      kind: 'choose',
      select: select.expr,
      whenTrue: whenTrue.expr,
      whenFalse: whenFalse.expr,
    };
    return this.node(expr, Math.max(select.depth, whenTrue.depth, whenFalse.depth));
  }

  private static readonly LEVELS = [
    ['|', 'or'],
    ['^', 'xor'],
    ['&', 'and'],
  ] as const;

  /** A chain of one operator, built as a balanced tree (the operators are associative). */
  private binary(level: number, nesting: number): Built {
    if (level === Parser.LEVELS.length) return this.unary(nesting);
    const [symbol, kind] = Parser.LEVELS[level]!;
    const operands = [this.binary(level + 1, nesting)];
    while (this.take(symbol)) operands.push(this.binary(level + 1, nesting));
    return this.balanced(kind, operands);
  }

  private balanced(kind: 'and' | 'or' | 'xor', operands: readonly Built[]): Built {
    let layer = operands;
    while (layer.length > 1) {
      const next: Built[] = [];
      for (let k = 0; k + 1 < layer.length; k += 2) {
        const [left, right] = [layer[k]!, layer[k + 1]!];
        next.push(this.node({ kind, left: left.expr, right: right.expr }, Math.max(left.depth, right.depth)));
      }
      if (layer.length % 2 === 1) next.push(layer[layer.length - 1]!);
      layer = next;
    }
    return layer[0]!;
  }

  /** `!` runs are folded: three negations equal one, and two are kept as two (`!!Z` is X, not Z). */
  private unary(nesting: number): Built {
    let nots = 0;
    while (this.take('!')) nots++;
    let result = this.primary(nesting);
    for (let k = 0; k < (nots === 0 ? 0 : 2 - (nots % 2)); k++)
      result = this.node({ kind: 'not', arg: result.expr }, result.depth);
    return result;
  }

  private primary(nesting: number): Built {
    const t = this.peek();
    if (!t) return this.fail('expression ends too early');
    this.i++;
    if (t.text === '(') {
      const inner = this.choose(nesting + 1);
      if (!this.take(')')) this.fail("expected ')'");
      return inner;
    }
    if (t.text === '0' || t.text === '1') return { expr: { kind: 'const', value: t.text }, depth: 1 };
    if (/^[A-Za-z_]/.test(t.text)) return { expr: this.name(t), depth: 1 };
    this.i--;
    return this.fail(`unexpected '${t.text}'`);
  }

  /** A name is an input; `Z` means high-impedance unless an input is called Z. */
  private name(t: Token): Expr {
    if (this.inputs.has(t.text)) return { kind: 'name', name: t.text, at: t.at };
    if (t.text === 'Z') return { kind: 'const', value: 'Z' };
    throw new ExpressionError(`'${printable(t.text)}' is not an input`, this.source, t.at);
  }

  private node(expr: Expr, childDepth: number): Built {
    if (childDepth >= MAX_EXPRESSION_DEPTH) this.fail(`nested more than ${MAX_EXPRESSION_DEPTH} levels deep`);
    return { expr, depth: childDepth + 1 };
  }

  private fail(message: string): never {
    const t = this.peek();
    throw new ExpressionError(message, this.source, t ? t.at : this.source.length);
  }
}

/**
 * Parses an expression. Names are checked against `inputs`; the name `Z` means high-impedance unless
 * an input is called Z. Never deeper than MAX_EXPRESSION_DEPTH, whatever the text.
 */
export function parseExpression(source: string, inputs: readonly string[]): Expr {
  return new Parser(source, tokenize(source), new Set(inputs)).parseAll();
}

/** Parses the expected function of `output`; an error names the output. */
export function parseExpectation(output: string, source: string, inputs: readonly string[]): Expr {
  try {
    return parseExpression(source, inputs);
  } catch (e) {
    if (!(e instanceof ExpressionError)) throw e;
    throw new ExpressionError(e.detail, e.source, e.position, output);
  }
}

/** Splits `Y = expr` into the output name and the expression text. */
export function splitExpectation(text: string): { output: string; expression: string } {
  const eq = text.indexOf('=');
  const output = eq < 0 ? '' : text.slice(0, eq).trim();
  if (eq < 0 || !/^[A-Za-z_][A-Za-z0-9_.[\]<>:#/-]*$/.test(output)) {
    throw new ExpressionError("expected 'OUTPUT = expression'", text, Math.max(eq, 0));
  }
  return { output, expression: text.slice(eq + 1) };
}
