/**
 * Liberty `function` and `three_state` expressions (the format's reference manual, the `function`
 * attribute; from memory): `'` after an operand and `!` before it invert, `^` is XOR, `*`, `&` and
 * plain white space between operands are AND, `+` and `|` are OR, with parentheses and the
 * constants 0 and 1. Inversion binds first, then XOR, then AND, then OR; equal operators group
 * left to right. Read by operator precedence with explicit stacks, so nesting costs no recursion.
 */

export type LogicExpr =
  | { readonly kind: 'const'; readonly value: 0 | 1 }
  | { readonly kind: 'name'; readonly name: string }
  | { readonly kind: 'not'; readonly arg: LogicExpr }
  | { readonly kind: 'and' | 'or' | 'xor'; readonly left: LogicExpr; readonly right: LogicExpr };

export class LibertyFunctionError extends Error {
  override readonly name = 'LibertyFunctionError';
  constructor(
    readonly source: string,
    readonly column: number,
    detail: string,
  ) {
    super(`${detail} at column ${column + 1} of "${source}"`);
  }
}

type Binary = 'and' | 'or' | 'xor';
const BINDING: Readonly<Record<Binary | 'not', number>> = { or: 1, and: 2, xor: 3, not: 4 };
const OPERATORS: Readonly<Record<string, Binary>> = {
  '+': 'or',
  '|': 'or',
  '*': 'and',
  '&': 'and',
  '^': 'xor',
};
const NAME = /[A-Za-z_][A-Za-z0-9_.[\]<>:#/$-]*/y;

interface Token {
  readonly text: string;
  readonly at: number;
}

function tokenize(source: string): Token[] {
  const out: Token[] = [];
  let i = 0;
  while (i < source.length) {
    const ch = source[i] as string;
    if (/\s/.test(ch)) i++;
    else if ("!'()01".includes(ch) || ch in OPERATORS) out.push({ text: ch, at: i++ });
    else {
      NAME.lastIndex = i;
      const m = NAME.exec(source);
      if (!m) throw new LibertyFunctionError(source, i, `unexpected character '${ch}'`);
      out.push({ text: m[0], at: i });
      i += m[0].length;
    }
  }
  return out;
}

type StackOp = { readonly op: Binary | 'not' | '('; readonly at: number };

export function parseLibertyFunction(source: string): LogicExpr {
  const values: LogicExpr[] = [];
  const ops: StackOp[] = [];
  const fail = (at: number, detail: string): never => {
    throw new LibertyFunctionError(source, at, detail);
  };
  const reduceWhile = (keep: (op: StackOp) => boolean): void => {
    for (let top = ops[ops.length - 1]; top !== undefined && keep(top); top = ops[ops.length - 1]) {
      ops.pop();
      apply(values, top, fail);
    }
  };
  let expectOperand = true;
  for (const t of tokenize(source)) {
    const binary = OPERATORS[t.text];
    if (expectOperand) {
      if (t.text === '!' || t.text === '(') ops.push({ op: t.text === '!' ? 'not' : '(', at: t.at });
      else if (binary !== undefined || t.text === ')' || t.text === "'") fail(t.at, `unexpected '${t.text}'`);
      else {
        values.push(operand(t.text));
        expectOperand = false;
      }
      continue;
    }
    if (t.text === "'") {
      reduceWhile((o) => o.op === 'not');
      values.push({ kind: 'not', arg: values.pop() as LogicExpr });
    } else if (t.text === ')') {
      reduceWhile((o) => o.op !== '(');
      if (ops.pop()?.op !== '(') fail(t.at, "a ')' without its '('");
    } else {
      // An operand right after an operand is AND (white space).
      const op = binary ?? 'and';
      reduceWhile((o) => o.op !== '(' && BINDING[o.op] >= BINDING[op]);
      ops.push({ op, at: t.at });
      expectOperand = true;
      if (binary === undefined) {
        if (t.text === '!' || t.text === '(') ops.push({ op: t.text === '!' ? 'not' : '(', at: t.at });
        else {
          values.push(operand(t.text));
          expectOperand = false;
        }
      }
    }
  }
  if (expectOperand)
    fail(
      source.length,
      values.length === 0 && ops.length === 0 ? 'empty function' : 'the function ends too early',
    );
  reduceWhile((o) => o.op !== '(');
  if (ops.length > 0) fail((ops[0] as StackOp).at, "a '(' is never closed");
  return values[0] as LogicExpr;
}

function operand(text: string): LogicExpr {
  return text === '0' || text === '1'
    ? { kind: 'const', value: text === '1' ? 1 : 0 }
    : { kind: 'name', name: text };
}

function apply(values: LogicExpr[], top: StackOp, fail: (at: number, detail: string) => never): void {
  if (top.op === '(') return fail(top.at, "a '(' is never closed");
  if (top.op === 'not') {
    values.push({ kind: 'not', arg: values.pop() as LogicExpr });
    return;
  }
  const right = values.pop() as LogicExpr;
  const left = values.pop() as LogicExpr;
  values.push({ kind: top.op, left, right });
}

/** Every name the expression reads, in first-use order. */
export function namesIn(e: LogicExpr): string[] {
  const seen = new Set<string>();
  const stack: LogicExpr[] = [e];
  const order: string[] = [];
  while (stack.length > 0) {
    const x = stack.pop() as LogicExpr;
    if (x.kind === 'name' && !seen.has(x.name)) {
      seen.add(x.name);
      order.push(x.name);
    } else if (x.kind === 'not') stack.push(x.arg);
    else if (x.kind !== 'name' && x.kind !== 'const') stack.push(x.right, x.left);
  }
  return order;
}

/**
 * The expression in the expected-function syntax of docs/semantics.md §4 (`!`, `&`, `|`, `^`),
 * every operation in parentheses because the two syntaxes rank XOR differently; names renamed.
 */
export function toExpectation(e: LogicExpr, rename: (name: string) => string): string {
  const parts: string[] = [];
  const stack: (LogicExpr | string)[] = [e];
  const symbol = { and: '&', or: '|', xor: '^' } as const;
  while (stack.length > 0) {
    const x = stack.pop() as LogicExpr | string;
    if (typeof x === 'string') parts.push(x);
    else if (x.kind === 'const') parts.push(String(x.value));
    else if (x.kind === 'name') parts.push(rename(x.name));
    else if (x.kind === 'not') stack.push(')', x.arg, '!(');
    else stack.push(')', x.right, ` ${symbol[x.kind]} `, x.left, '(');
  }
  return parts.join('');
}
