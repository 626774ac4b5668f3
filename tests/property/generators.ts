import fc from 'fast-check';
import { circuit, type CircuitBuilder } from '../../src/core/model/builder.ts';
import type { Device, Netlist } from '../../src/core/model/netlist.ts';

/** A series-parallel switch network over named inputs. */
export type SpTree =
  { kind: 'leaf'; input: string } | { kind: 'series' | 'parallel'; left: SpTree; right: SpTree };

export function spTree(inputs: readonly string[], depth = 3): fc.Arbitrary<SpTree> {
  const leaf = fc.constantFrom(...inputs).map((input): SpTree => ({ kind: 'leaf', input }));
  const { tree } = fc.letrec<{ tree: SpTree }>((tie) => ({
    tree: fc.oneof(
      { depthSize: 'small', maxDepth: depth },
      leaf,
      fc.record({
        kind: fc.constantFrom('series' as const, 'parallel' as const),
        left: tie('tree'),
        right: tie('tree'),
      }),
    ),
  }));
  return tree;
}

/** The Boolean function under which the NMOS version of the network conducts. */
export function conducts(t: SpTree): string {
  if (t.kind === 'leaf') return t.input;
  return `(${conducts(t.left)} ${t.kind === 'series' ? '&' : '|'} ${conducts(t.right)})`;
}

function dual(t: SpTree): SpTree {
  if (t.kind === 'leaf') return t;
  return { kind: t.kind === 'series' ? 'parallel' : 'series', left: dual(t.left), right: dual(t.right) };
}

/** Places the network between nets `top` and `bottom`, naming devices and internal nets uniquely. */
function place(
  b: CircuitBuilder,
  t: SpTree,
  kind: 'nmos' | 'pmos',
  top: string,
  bottom: string,
  counter: { n: number; readonly tag: string; readonly drop: number },
): CircuitBuilder {
  if (t.kind === 'leaf') {
    const n = counter.n++;
    if (n === counter.drop) return b;
    const name = `${kind === 'nmos' ? 'N' : 'P'}${counter.tag}${n}`;
    return b[kind](name, { g: t.input, d: top, s: bottom, w: kind === 'nmos' ? 1 : 2 });
  }
  if (t.kind === 'parallel')
    return place(place(b, t.left, kind, top, bottom, counter), t.right, kind, top, bottom, counter);
  const mid = `${counter.tag}${kind}_m${counter.n++}`;
  return place(place(b, t.left, kind, top, mid, counter), t.right, kind, mid, bottom, counter);
}

/** A complementary static CMOS gate: pull-down network `t`, pull-up network its dual. Y = !f(t). */
export function complementaryGate(t: SpTree, inputs: readonly string[]): Netlist {
  const b = circuit('sp')
    .rails()
    .input(...inputs)
    .output('Y');
  return complementaryGateOn(b, t, 'Y', '', 0).build();
}

/**
 * Adds the gate with pull-down `t` and its dual pull-up onto `y`, naming devices and internal nets
 * with `tag`; `drop` (counted from 1 as devices are placed, 0 for none) leaves one device out.
 */
export function complementaryGateOn(
  b: CircuitBuilder,
  t: SpTree,
  y: string,
  tag: string,
  drop: number,
): CircuitBuilder {
  const counter = { n: 1, tag, drop };
  const down = place(b, t, 'nmos', y, 'GND', counter);
  return place(down, dual(t), 'pmos', 'VDD', y, counter);
}

/** Any netlist over a small pool of nets: every device kind, any connection, odd sizes. */
export function randomNetlist(): fc.Arbitrary<Netlist> {
  const nets = ['VDD', 'GND', 'A', 'B', 'Y', 'n1', 'n2', 'n3'];
  const net = fc.constantFrom(...nets);
  const device = fc.oneof(
    fc.record({
      kind: fc.constantFrom('nmos' as const, 'pmos' as const),
      gate: net,
      drain: net,
      source: net,
      w: fc.double({ min: 0.1, max: 10, noNaN: true }),
      l: fc.double({ min: 0.1, max: 2, noNaN: true }),
    }),
    fc.record({
      kind: fc.constant('resistor' as const),
      a: net,
      b: net,
      ohms: fc.double({ min: 1, max: 1e7, noNaN: true }),
    }),
    fc.record({
      kind: fc.constant('capacitor' as const),
      a: net,
      b: net,
      farads: fc.double({ min: 1e-16, max: 1e-12, noNaN: true }),
    }),
  );
  return fc
    .array(device, { minLength: 1, maxLength: 12 })
    .map((devices) => poolNetlist('random', devices, ['Y', 'n1']));
}

/** Devices over the nets of a pool, named D0, D1…, with rails VDD and GND and inputs A and B. */
function poolNetlist(name: string, devices: readonly Omit<Device, 'name'>[], outputs: string[]): Netlist {
  return {
    name,
    devices: devices.map((d, i) => ({ ...d, name: `D${i}` }) as Device),
    rails: [
      { net: 'VDD', role: 'supply' },
      { net: 'GND', role: 'ground' },
    ],
    inputs: ['A', 'B'],
    outputs,
  };
}

/**
 * Pass networks: transistors whose gates sit at a rail or an input (so every device is definitely on
 * or off) and resistors, wired at random between inputs, rails and internal nets. Levels reach nets
 * along several paths of different lengths with threshold drops, which is where a degraded level's
 * limiter is chosen.
 */
export function passNetwork(): fc.Arbitrary<Netlist> {
  const nets = ['VDD', 'GND', 'A', 'B', 'Y', 'n1', 'n2', 'n3'];
  const net = fc.constantFrom(...nets);
  const transistor = fc.record({
    kind: fc.constantFrom('nmos' as const, 'pmos' as const),
    gate: fc.constantFrom('VDD', 'GND', 'A', 'B'),
    drain: net,
    source: net,
    w: fc.constantFrom(0.5, 1, 2),
    l: fc.constant(0.25),
  });
  const resistor = fc.record({
    kind: fc.constant('resistor' as const),
    a: net,
    b: net,
    ohms: fc.constantFrom(1e3, 1e5),
  });
  const device = fc.oneof({ weight: 3, arbitrary: transistor }, { weight: 2, arbitrary: resistor });
  return fc
    .array(device, { minLength: 4, maxLength: 14 })
    .map((devices) => poolNetlist('pass', devices, ['Y', 'n1', 'n2', 'n3']));
}
