import type { InputValue } from '../model/design.ts';
import { own } from '../model/records.ts';
import type { Expr } from './parse.ts';

export type ExpectedValue = '0' | '1' | 'X' | 'Z';

/**
 * Evaluates an expected function for one input vector. Inputs at X or Z make the result X where
 * they matter; Z as an operand of a logic operator gives X (it is only meaningful as a result).
 */
export function evaluateExpression(e: Expr, inputs: Readonly<Record<string, InputValue>>): ExpectedValue {
  switch (e.kind) {
    case 'const':
      return e.value;
    case 'name': {
      const v = own(inputs, e.name);
      return v === '0' || v === '1' ? v : 'X';
    }
    case 'not': {
      const v = evaluateExpression(e.arg, inputs);
      return v === '0' ? '1' : v === '1' ? '0' : 'X';
    }
    case 'and':
    case 'or':
    case 'xor':
      return combine(e.kind, evaluateExpression(e.left, inputs), evaluateExpression(e.right, inputs));
    case 'choose': {
      const s = evaluateExpression(e.select, inputs);
      const t = evaluateExpression(e.whenTrue, inputs);
      const f = evaluateExpression(e.whenFalse, inputs);
      if (s === '1') return t;
      if (s === '0') return f;
      return t === f ? t : 'X';
    }
  }
}

function combine(op: 'and' | 'or' | 'xor', a: ExpectedValue, b: ExpectedValue): ExpectedValue {
  const known = (v: ExpectedValue): v is '0' | '1' => v === '0' || v === '1';
  if (op === 'and' && (a === '0' || b === '0')) return '0';
  if (op === 'or' && (a === '1' || b === '1')) return '1';
  if (!known(a) || !known(b)) return 'X';
  const x = a === '1';
  const y = b === '1';
  const r = op === 'and' ? x && y : op === 'or' ? x || y : x !== y;
  return r ? '1' : '0';
}
