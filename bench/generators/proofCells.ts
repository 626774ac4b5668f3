/**
 * Wide static CMOS cells for the proof rows of the benchmark: too many inputs for an exhaustive sweep.
 *
 * - `equalityComparator(bits)`: EQ = 1 when A = B, from buffered inputs, one XNOR per bit (an XOR of
 *   four NAND2 gates and an inverter) and an AND tree of NAND2-plus-inverter gates.
 * - `nandRippleAdder(bits)`: a ripple-carry adder whose full adder is nine NAND2 gates, a topology
 *   different from the mirror adder of mirrorAdder.ts with the same pins (A0…, B0…, CI; S0…, CO).
 * - `miswire(netlist, device, gate)`: the same cell with one transistor's gate moved to another net.
 */
import type { Device, Netlist } from '../../src/core/model/netlist.ts';
import { assemble, GND, inverter, NMOS_W, numbered, PMOS_W, VDD, cellDevices } from './parts.ts';

/** A static CMOS NAND2 from `a`, `b` to `y`: parallel PMOS, series NMOS (devices `${prefix}…`). */
export function nand2(prefix: string, a: string, b: string, y: string): readonly Device[] {
  return cellDevices((c) =>
    c
      .pmos(`${prefix}PA`, { g: a, d: y, s: VDD, w: PMOS_W })
      .pmos(`${prefix}PB`, { g: b, d: y, s: VDD, w: PMOS_W })
      .nmos(`${prefix}NA`, { g: a, d: y, s: `${prefix}x`, w: 2 * NMOS_W })
      .nmos(`${prefix}NB`, { g: b, d: `${prefix}x`, s: GND, w: 2 * NMOS_W }),
  );
}

/** y = a XOR b from four NAND2 gates (common practice, no source). */
function xorOfNands(p: string, a: string, b: string, y: string): readonly Device[] {
  return [
    ...nand2(`${p}g1.`, a, b, `${p}n1`),
    ...nand2(`${p}g2.`, a, `${p}n1`, `${p}n2`),
    ...nand2(`${p}g3.`, b, `${p}n1`, `${p}n3`),
    ...nand2(`${p}g4.`, `${p}n2`, `${p}n3`, y),
  ];
}

/** An n-bit equality comparator: inputs A0…, B0…, output EQ; 32 bits give 1,018 transistors. */
export function equalityComparator(bits: number): Netlist {
  if (!Number.isInteger(bits) || bits < 1)
    throw new RangeError(`bits must be a positive integer, got ${bits}`);
  const a = numbered('A', bits);
  const b = numbered('B', bits);
  const cells: (readonly Device[])[] = [];
  const buffered = (pin: string): string => {
    cells.push(inverter(`buf.${pin}.1`, pin, `${pin}_n`), inverter(`buf.${pin}.2`, `${pin}_n`, `${pin}_b`));
    return `${pin}_b`;
  };
  let level = a.map((ai, i) => {
    const [x, y] = [buffered(ai), buffered(`B${i}`)];
    cells.push(xorOfNands(`x${i}.`, x, y, `d${i}`), inverter(`x${i}.inv`, `d${i}`, `e${i}`));
    return `e${i}`;
  });
  for (let depth = 0; level.length > 1; depth++) {
    const next: string[] = [];
    for (let i = 0; i + 1 < level.length; i += 2) {
      const y = level.length === 2 ? 'EQ' : `t${depth}_${i / 2}`;
      cells.push(
        nand2(`and${depth}_${i / 2}.`, level[i]!, level[i + 1]!, `${y}_n`), // i + 1 < length
        inverter(`and${depth}_${i / 2}.inv`, `${y}_n`, y),
      );
      next.push(y);
    }
    const last = level[level.length - 1];
    if (level.length % 2 === 1 && last !== undefined) next.push(last);
    level = next;
  }
  const outputs = bits === 1 ? ['e0'] : ['EQ'];
  return assemble(`equality-${bits}`, { inputs: [...a, ...b], outputs }, cells);
}

/** The expected function of the comparator: EQ = !(A0 ^ B0) & … (docs/semantics.md §4 syntax). */
export function equalityExpectation(bits: number): string {
  return Array.from({ length: bits }, (_, i) => `!(A${i} ^ B${i})`).join(' & ');
}

/**
 * A full adder of nine NAND2 gates: n1 = !(A·B), the XOR of A and B from n1, then the same for
 * that XOR and CI; CO = !(n1 · n5). 36 transistors (common practice, no source).
 */
export function nandFullAdder(
  p: string,
  n: { a: string; b: string; ci: string; sum: string; co: string },
): readonly Device[] {
  return [
    ...nand2(`${p}g1.`, n.a, n.b, `${p}n1`),
    ...nand2(`${p}g2.`, n.a, `${p}n1`, `${p}n2`),
    ...nand2(`${p}g3.`, n.b, `${p}n1`, `${p}n3`),
    ...nand2(`${p}g4.`, `${p}n2`, `${p}n3`, `${p}x`),
    ...nand2(`${p}g5.`, `${p}x`, n.ci, `${p}n5`),
    ...nand2(`${p}g6.`, `${p}x`, `${p}n5`, `${p}n6`),
    ...nand2(`${p}g7.`, n.ci, `${p}n5`, `${p}n7`),
    ...nand2(`${p}g8.`, `${p}n6`, `${p}n7`, n.sum),
    ...nand2(`${p}g9.`, `${p}n1`, `${p}n5`, n.co),
  ];
}

/** An n-bit ripple-carry adder of NAND full adders, with the pins of `rippleAdder(bits)`. */
export function nandRippleAdder(bits: number): Netlist {
  if (!Number.isInteger(bits) || bits < 1)
    throw new RangeError(`bits must be a positive integer, got ${bits}`);
  const a = numbered('A', bits);
  const b = numbered('B', bits);
  const sum = numbered('S', bits);
  const carry = (i: number): string => (i === 0 ? 'CI' : i === bits ? 'CO' : `c${i}`);
  const cells = sum.map((s, i) =>
    nandFullAdder(`FA${i}.`, { a: `A${i}`, b: `B${i}`, ci: carry(i), sum: s, co: carry(i + 1) }),
  );
  return assemble(
    `nand-ripple-adder-${bits}`,
    { inputs: [...a, ...b, 'CI'], outputs: [...sum, 'CO'] },
    cells,
  );
}

/** The cell with device `name`'s gate moved to net `gate`: a single miswired transistor. */
export function miswire(netlist: Netlist, name: string, gate: string): Netlist {
  let found = false;
  const devices = netlist.devices.map((d) => {
    if (d.name !== name || (d.kind !== 'nmos' && d.kind !== 'pmos')) return d;
    found = true;
    return { ...d, gate };
  });
  if (!found) throw new RangeError(`no transistor named ${name}`);
  return { ...netlist, name: `${netlist.name}-miswired`, devices };
}
