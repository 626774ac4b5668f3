import fc from 'fast-check';
import { circuit, type CircuitBuilder } from '../../src/core/model/builder.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';

/**
 * Random cells that are combinational by construction, built from transmission-gate multiplexers
 * and NAND2 gates over a pool of signals that always carries each signal with its complement (an
 * inverter's output). A multiplexer's select and its complement drive the gates; its data inputs may
 * be inverter outputs that also select elsewhere, so control nets loop back through channels as in a
 * transmission-gate carry, although no signal depends on itself. Every net is driven by exactly one
 * conducting path per vector, so each input vector has exactly one steady state, and each signal's
 * truth table is known.
 */
export interface PassGateCell {
  readonly netlist: Netlist;
  /** Truth table of the output Y over the inputs, index = inputs read as a binary number (first input most significant). */
  readonly table: readonly number[];
}

type Stage =
  | { readonly kind: 'mux'; readonly select: number; readonly d0: number; readonly d1: number }
  | { readonly kind: 'nand'; readonly a: number; readonly b: number };

/** A signal of the pool: its net, the net of its complement, and its truth table. */
interface Signal {
  readonly net: string;
  readonly complement: string;
  readonly table: number[];
}

export function passGateCell(): fc.Arbitrary<PassGateCell> {
  const pick = fc.nat();
  const stage = fc.oneof(
    {
      weight: 3,
      arbitrary: fc.record({ kind: fc.constant('mux' as const), select: pick, d0: pick, d1: pick }),
    },
    { weight: 1, arbitrary: fc.record({ kind: fc.constant('nand' as const), a: pick, b: pick }) },
  );
  return fc
    .record({
      inputs: fc.integer({ min: 2, max: 3 }),
      stages: fc.array(stage, { minLength: 1, maxLength: 3 }),
    })
    .map(({ inputs, stages }) => build(inputs, stages));
}

function build(inputCount: number, stages: readonly Stage[]): PassGateCell {
  const inputs = Array.from({ length: inputCount }, (_, i) => `I${i}`);
  const rows = 2 ** inputCount;
  let b = circuit('passgate')
    .rails()
    .input(...inputs)
    .output('Y');
  const pool: Signal[] = [];
  inputs.forEach((name, i) => {
    const table = Array.from({ length: rows }, (_, v) => (v >> (inputCount - 1 - i)) & 1);
    b = inverter(b, `${name}b`, name, `${name}b`);
    pool.push({ net: name, complement: `${name}b`, table });
    pool.push({ net: `${name}b`, complement: name, table: table.map((x) => 1 - x) });
  });
  stages.forEach((s, k) => {
    const out = `m${k}`;
    const of = (i: number): Signal => pool[i % pool.length]!;
    let table: number[];
    if (s.kind === 'mux') {
      const [sel, d0, d1] = [of(s.select), of(s.d0), of(s.d1)];
      b = transmissionGate(b, `T${k}a`, d1.net, out, sel.net, sel.complement);
      b = transmissionGate(b, `T${k}b`, d0.net, out, sel.complement, sel.net);
      table = sel.table.map((x, v) => (x ? d1.table[v]! : d0.table[v]!));
    } else {
      const [x, y] = [of(s.a), of(s.b)];
      b = b
        .pmos(`PA${k}`, { g: x.net, d: out, s: 'VDD', w: 2 })
        .pmos(`PB${k}`, { g: y.net, d: out, s: 'VDD', w: 2 })
        .nmos(`NA${k}`, { g: x.net, d: out, s: `${out}_x`, w: 2 })
        .nmos(`NB${k}`, { g: y.net, d: `${out}_x`, s: 'GND', w: 2 });
      table = x.table.map((p, v) => 1 - (p & y.table[v]!));
    }
    b = inverter(b, `${out}b`, out, `${out}b`);
    pool.push({ net: out, complement: `${out}b`, table });
    pool.push({ net: `${out}b`, complement: out, table: table.map((x) => 1 - x) });
  });
  // The output buffers the last stage, so Y itself is a plain inverter output.
  const last = pool[pool.length - 1]!;
  b = inverter(b, 'Y', last.net, 'Y');
  return { netlist: b.build(), table: last.table.map((x) => 1 - x) };
}

function inverter(b: CircuitBuilder, tag: string, a: string, y: string): CircuitBuilder {
  return b.pmos(`P${tag}`, { g: a, d: y, s: 'VDD', w: 2 }).nmos(`N${tag}`, { g: a, d: y, s: 'GND', w: 1 });
}

/** NMOS gated by `on`, PMOS gated by `onBar`, in parallel between a and y. */
function transmissionGate(
  b: CircuitBuilder,
  tag: string,
  a: string,
  y: string,
  on: string,
  onBar: string,
): CircuitBuilder {
  return b.nmos(`N${tag}`, { g: on, d: a, s: y }).pmos(`P${tag}`, { g: onBar, d: a, s: y, w: 2 });
}
