/**
 * The group syntax of a Liberty file, read without recursion (a deeply nested file costs no
 * stack): `name (args) { … }` groups, `name : value ;` simple attributes and `name (args) ;`
 * complex attributes. The semicolon after an attribute may be missing, as some writers leave it.
 */
import { LibertyError, libertyTokens, type Token } from './libertyLexer.ts';

export interface LibertyAttribute {
  readonly name: string;
  /** The value of a simple attribute, or the arguments of a complex one. */
  readonly values: readonly string[];
  readonly line: number;
}

export interface LibertyGroup {
  readonly type: string;
  readonly names: readonly string[];
  readonly line: number;
  readonly attributes: LibertyAttribute[];
  readonly groups: LibertyGroup[];
}

/** The top-level groups of the file (normally one `library`). */
export function readLibertyGroups(text: string): LibertyGroup[] {
  const t = libertyTokens(text);
  const root: LibertyGroup = { type: '', names: [], line: 1, attributes: [], groups: [] };
  const stack: LibertyGroup[] = [root];
  let i = 0;
  while (i < t.length) {
    const group = stack[stack.length - 1] as LibertyGroup;
    const head = t[i] as Token;
    if (head.kind === 'punct' && head.text === '}') {
      if (stack.length === 1) throw new LibertyError(head.line, 'a "}" closes no group');
      stack.pop();
      i = skip(t, i + 1, ';');
    } else if (head.kind === 'punct' && head.text === ';') i++;
    else if (head.kind === 'punct') throw new LibertyError(head.line, `unexpected "${head.text}"`);
    else i = statement(t, i, group, stack);
  }
  const open = stack[stack.length - 1] as LibertyGroup;
  if (stack.length > 1) throw new LibertyError(open.line, `group ${open.type} is never closed`);
  return root.groups;
}

function statement(t: readonly Token[], i: number, group: LibertyGroup, stack: LibertyGroup[]): number {
  const head = t[i] as Token;
  const next = t[i + 1];
  if (next?.text === ':' && next.kind === 'punct') {
    const { values, end } = simpleValue(t, i + 2, head.line);
    group.attributes.push({ name: head.text, values, line: head.line });
    return end;
  }
  if (next?.text !== '(' || next.kind !== 'punct')
    throw new LibertyError(head.line, `"${head.text}" is followed by neither ":" nor "("`);
  const { args, end } = argumentList(t, i + 2, head.line);
  if (t[end]?.text === '{' && t[end]?.kind === 'punct') {
    const child: LibertyGroup = { type: head.text, names: args, line: head.line, attributes: [], groups: [] };
    group.groups.push(child);
    stack.push(child);
    return end + 1;
  }
  group.attributes.push({ name: head.text, values: args, line: head.line });
  return skip(t, end, ';');
}

/** Words and strings up to `;`, or up to the end of the line the attribute ends on. */
function simpleValue(t: readonly Token[], i: number, line: number): { values: string[]; end: number } {
  const values: string[] = [];
  let j = i;
  while (j < t.length) {
    const tok = t[j] as Token;
    if (tok.kind === 'punct' && (tok.text === ';' || tok.text === '}')) break;
    const startsStatement = t[j + 1]?.text === ':' || t[j + 1]?.text === '(';
    if (values.length > 0 && tok.line !== (t[j - 1] as Token).line && startsStatement) break;
    values.push(tok.text);
    j++;
  }
  if (values.length === 0) throw new LibertyError(line, 'an attribute has no value');
  return { values: [values.join(' ')], end: skip(t, j, ';') };
}

function argumentList(t: readonly Token[], i: number, line: number): { args: string[]; end: number } {
  const args: string[] = [];
  let j = i;
  for (; j < t.length; j++) {
    const tok = t[j] as Token;
    if (tok.kind === 'punct' && tok.text === ')') return { args, end: j + 1 };
    if (tok.kind === 'punct' && tok.text !== ',')
      throw new LibertyError(tok.line, `unexpected "${tok.text}" in a list of arguments`);
    if (tok.kind !== 'punct') args.push(tok.text);
  }
  throw new LibertyError(line, 'a "(" is never closed');
}

function skip(t: readonly Token[], i: number, text: string): number {
  const tok = t[i];
  return tok !== undefined && tok.kind === 'punct' && tok.text === text ? i + 1 : i;
}
