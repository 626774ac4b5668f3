import fc from 'fast-check';
import { circuit, type CircuitBuilder } from '../../src/core/model/builder.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { complementaryGateOn, type SpTree } from './generators.ts';

/**
 * Random cells without logical feedback: each stage reads signals made before it (inputs or earlier
 * stages), so every vector has one steady state. Stages cover what a cell designer draws and what
 * goes wrong in it: static gates (some with a device left out, so a level floats or fights),
 * inverters, transmission-gate multiplexers, single NMOS pass devices (degraded highs, floating when
 * off), tristate inverters, pseudo-NMOS gates (static current) and two drivers on one net
 * (contention). Signals passed through channels join their drivers' components, so groups of several
 * components (as in a transmission-gate carry) occur too.
 */
export interface StagedCell {
  readonly netlist: Netlist;
  /** Per output, the stage's intended function in docs/semantics.md §4 syntax (a guess for broken stages). */
  readonly expectations: Record<string, string>;
}

type StageKind = 'gate' | 'broken-gate' | 'inverter' | 'mux' | 'pass' | 'tristate' | 'pseudo' | 'fight';

interface Stage {
  readonly kind: StageKind;
  readonly picks: readonly number[];
  readonly shape: number;
}

const KINDS: readonly { weight: number; kind: StageKind }[] = [
  { weight: 5, kind: 'gate' },
  { weight: 1, kind: 'broken-gate' },
  { weight: 2, kind: 'inverter' },
  { weight: 3, kind: 'mux' },
  { weight: 1, kind: 'pass' },
  { weight: 1, kind: 'tristate' },
  { weight: 1, kind: 'pseudo' },
  { weight: 1, kind: 'fight' },
];

export function stagedCell(
  options: { maxInputs?: number; maxStages?: number; kinds?: readonly StageKind[] } = {},
) {
  const kinds = KINDS.filter((k) => options.kinds?.includes(k.kind) ?? true);
  const stage = fc.record({
    kind: fc.oneof(...kinds.map((k) => ({ weight: k.weight, arbitrary: fc.constant(k.kind) }))),
    picks: fc.array(fc.nat(), { minLength: 4, maxLength: 4 }),
    shape: fc.nat(),
  });
  return fc
    .record({
      inputs: fc.integer({ min: 1, max: options.maxInputs ?? 6 }),
      stages: fc.array(stage, { minLength: 1, maxLength: options.maxStages ?? 5 }),
      outputs: fc.integer({ min: 1, max: 2 }),
      flip: fc.nat(),
    })
    .map(({ inputs, stages, outputs, flip }) => build(inputs, stages, outputs, flip));
}

interface Signal {
  readonly net: string;
  /** Its function of the inputs, or null where it is no Boolean function (Z, fights). */
  readonly expr: string | null;
}

function build(inputCount: number, stages: readonly Stage[], outputCount: number, flip: number): StagedCell {
  const inputs = Array.from({ length: inputCount }, (_, i) => `I${i}`);
  const pool: Signal[] = inputs.map((net) => ({ net, expr: net }));
  let b = circuit('staged')
    .rails()
    .input(...inputs);
  stages.forEach((s, k) => {
    const [made, signal] = addStage(b, s, `s${k}`, (i) => pool[(s.picks[i] ?? 0) % pool.length]!); // the pool holds the inputs at least
    b = made;
    pool.push(signal);
  });
  const made = pool.slice(inputCount);
  const outputs = made.slice(-outputCount);
  const expectations: Record<string, string> = {};
  outputs.forEach((o, i) => {
    // Some expectations are negated on purpose, so a proof has something to find.
    const wrong = ((flip >> i) & 3) === 0;
    const expr = o.expr ?? '0';
    expectations[o.net] = wrong ? `!(${expr})` : expr;
  });
  return { netlist: b.output(...outputs.map((o) => o.net)).build(), expectations };
}

function addStage(
  b: CircuitBuilder,
  s: Stage,
  out: string,
  pick: (i: number) => Signal,
): [CircuitBuilder, Signal] {
  const [p, q, r] = [pick(0), pick(1), pick(2)];
  // A function of signals that are no function (Z, fights) is none either.
  const of = (used: readonly Signal[], expr: () => string): string | null =>
    used.every((u) => u.expr !== null) ? expr() : null;
  switch (s.kind) {
    case 'gate':
    case 'broken-gate': {
      const tree = treeOf(s.shape, [p, q, r]);
      const built = complementaryGateOn(
        b,
        tree.tree,
        out,
        out,
        s.kind === 'broken-gate' ? 1 + (s.shape % 3) : 0,
      );
      return [built, { net: out, expr: s.kind === 'gate' ? of(tree.used, () => `!${tree.expr}`) : null }];
    }
    case 'inverter':
      return [inverter(b, out, p.net, out), { net: out, expr: of([p], () => `!${paren(p)}`) }];
    case 'mux': {
      const sb = `${out}_sb`;
      const made = tg(
        tg(inverter(b, `${out}i`, p.net, sb), `${out}a`, q.net, out, p.net, sb),
        `${out}b`,
        r.net,
        out,
        sb,
        p.net,
      );
      return [made, { net: out, expr: of([p, q, r], () => `(${paren(p)} ? ${paren(q)} : ${paren(r)})`) }];
    }
    case 'pass':
      return [b.nmos(`N${out}`, { g: p.net, d: q.net, s: out }), { net: out, expr: null }];
    case 'tristate': {
      const eb = `${out}_eb`;
      const made = inverter(b, `${out}e`, p.net, eb)
        .pmos(`P${out}a`, { g: q.net, d: `${out}_u`, s: 'VDD', w: 2 })
        .pmos(`P${out}b`, { g: eb, d: out, s: `${out}_u`, w: 2 })
        .nmos(`N${out}b`, { g: p.net, d: out, s: `${out}_d` })
        .nmos(`N${out}a`, { g: q.net, d: `${out}_d`, s: 'GND' });
      return [made, { net: out, expr: null }];
    }
    case 'pseudo': {
      const made = b
        .pmos(`P${out}`, { g: 'GND', d: out, s: 'VDD', w: 0.5 })
        .nmos(`N${out}a`, { g: p.net, d: out, s: 'GND', w: 2 })
        .nmos(`N${out}b`, { g: q.net, d: out, s: 'GND', w: 2 });
      return [made, { net: out, expr: of([p, q], () => `!(${paren(p)} | ${paren(q)})`) }];
    }
    case 'fight':
      return [inverter(inverter(b, `${out}f`, q.net, out), out, p.net, out), { net: out, expr: null }];
  }
}

function paren(s: Signal): string {
  return `(${s.expr})`;
}

/** A small series-parallel tree over up to three signals, chosen by `shape`. */
function treeOf(
  shape: number,
  signals: readonly [Signal, Signal, Signal],
): { tree: SpTree; expr: string; used: Signal[] } {
  const leaf = (s: Signal): SpTree => ({ kind: 'leaf', input: s.net });
  const [p, q, r] = signals;
  switch (shape % 4) {
    case 0:
      return { tree: leaf(p), expr: paren(p), used: [p] };
    case 1:
      return {
        tree: { kind: 'series', left: leaf(p), right: leaf(q) },
        expr: `(${paren(p)} & ${paren(q)})`,
        used: [p, q],
      };
    case 2:
      return {
        tree: { kind: 'parallel', left: leaf(p), right: leaf(q) },
        expr: `(${paren(p)} | ${paren(q)})`,
        used: [p, q],
      };
    default:
      return {
        tree: { kind: 'parallel', left: { kind: 'series', left: leaf(p), right: leaf(q) }, right: leaf(r) },
        expr: `(${paren(p)} & ${paren(q)} | ${paren(r)})`,
        used: [p, q, r],
      };
  }
}

function inverter(b: CircuitBuilder, tag: string, a: string, y: string): CircuitBuilder {
  return b.pmos(`P${tag}`, { g: a, d: y, s: 'VDD', w: 2 }).nmos(`N${tag}`, { g: a, d: y, s: 'GND' });
}

function tg(b: CircuitBuilder, tag: string, a: string, y: string, on: string, onBar: string): CircuitBuilder {
  return b.nmos(`N${tag}`, { g: on, d: a, s: y }).pmos(`P${tag}`, { g: onBar, d: a, s: y, w: 2 });
}
