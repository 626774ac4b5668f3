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

/** A bad expression; `position` is the 0-based column of the offending token in `source`. */
export class ExpressionError extends Error {
  override readonly name = 'ExpressionError';
  constructor(
    message: string,
    readonly source: string,
    readonly position: number,
  ) {
    super(`${message} at column ${position + 1} of "${source}"`);
  }
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
    const ch = source[i];
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
      throw new ExpressionError(`unexpected character '${ch}'`, source, i);
    }
  }
  return tokens;
}

class Parser {
  private i = 0;
  constructor(
    private readonly source: string,
    private readonly tokens: Token[],
  ) {}

  parseAll(): Expr {
    if (this.tokens.length === 0) throw new ExpressionError('empty expression', this.source, 0);
    const e = this.choose();
    const extra = this.tokens[this.i];
    if (extra) throw new ExpressionError(`unexpected '${extra.text}'`, this.source, extra.at);
    return e;
  }

  private peek(): Token | undefined {
    return this.tokens[this.i];
  }

  private take(text: string): boolean {
    if (this.peek()?.text !== text) return false;
    this.i++;
    return true;
  }

  private choose(): Expr {
    const select = this.binary(0);
    if (!this.take('?')) return select;
    const whenTrue = this.choose();
    if (!this.take(':')) this.fail("expected ':'");
    return { kind: 'choose', select, whenTrue, whenFalse: this.choose() };
  }

  private static readonly LEVELS = [
    ['|', 'or'],
    ['^', 'xor'],
    ['&', 'and'],
  ] as const;

  private binary(level: number): Expr {
    if (level === Parser.LEVELS.length) return this.unary();
    const [symbol, kind] = Parser.LEVELS[level];
    let left = this.binary(level + 1);
    while (this.take(symbol)) left = { kind, left, right: this.binary(level + 1) };
    return left;
  }

  private unary(): Expr {
    if (this.take('!')) return { kind: 'not', arg: this.unary() };
    const t = this.peek();
    if (!t) return this.fail('expression ends too early');
    this.i++;
    if (t.text === '(') {
      const inner = this.choose();
      if (!this.take(')')) this.fail("expected ')'");
      return inner;
    }
    if (t.text === '0' || t.text === '1') return { kind: 'const', value: t.text };
    if (/^[A-Za-z_]/.test(t.text)) return { kind: 'name', name: t.text, at: t.at };
    this.i--;
    return this.fail(`unexpected '${t.text}'`);
  }

  private fail(message: string): never {
    const t = this.peek();
    throw new ExpressionError(message, this.source, t ? t.at : this.source.length);
  }
}

/**
 * Parses an expression. Names are checked against `inputs`; the name `Z` means high-impedance unless
 * an input is called Z.
 */
export function parseExpression(source: string, inputs: readonly string[]): Expr {
  const expr = new Parser(source, tokenize(source)).parseAll();
  return bind(expr, source, new Set(inputs));
}

function bind(e: Expr, source: string, inputs: ReadonlySet<string>): Expr {
  switch (e.kind) {
    case 'const':
      return e;
    case 'name':
      if (inputs.has(e.name)) return e;
      if (e.name === 'Z') return { kind: 'const', value: 'Z' };
      throw new ExpressionError(`'${e.name}' is not an input`, source, e.at);
    case 'not':
      return { kind: 'not', arg: bind(e.arg, source, inputs) };
    case 'and':
    case 'or':
    case 'xor':
      return { kind: e.kind, left: bind(e.left, source, inputs), right: bind(e.right, source, inputs) };
    case 'choose':
      return {
        kind: 'choose',
        select: bind(e.select, source, inputs),
        whenTrue: bind(e.whenTrue, source, inputs),
        whenFalse: bind(e.whenFalse, source, inputs),
      };
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
