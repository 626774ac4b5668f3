import { LuDecomposition, Matrix } from 'ml-matrix';

/** A conductance between two nets, siemens. */
export interface Stamp {
  readonly a: number;
  readonly b: number;
  readonly g: number;
}

/**
 * Sets the voltage of every free net from Kirchhoff's current law over the stamped conductances,
 * the other nets' voltages held fixed. `localOf[net]` numbers the free nets 0..free.length−1 (−1 for
 * fixed nets). Free nets fall into small groups (a stack's internal nodes), so each connected group is
 * solved on its own: a lone net directly as the conductance-weighted mean of its neighbours, a pair
 * (the joints of a stack of three off transistors) in closed form, a larger group by ml-matrix's LU.
 * The small cases matter: a 16-input sweep of a 1,800-transistor block meets some 100 per vector.
 * A group tied to no fixed net carries no current and is left at 0 V.
 */
export function solveFreeNets(
  stamps: readonly Stamp[],
  volts: Float64Array,
  free: readonly number[],
  localOf: Int32Array,
): void {
  const touching: Stamp[][] = free.map(() => []);
  const parent = Int32Array.from(free, (_, i) => i);
  const root = (i: number): number => {
    while (parent[i] !== i) i = parent[i] = parent[parent[i]];
    return i;
  };
  for (const s of stamps) {
    if (s.a === s.b) continue;
    const la = localOf[s.a];
    const lb = localOf[s.b];
    if (la >= 0) touching[la].push(s);
    if (lb >= 0) touching[lb].push(s);
    if (la >= 0 && lb >= 0) parent[root(la)] = root(lb);
  }
  const groups: number[][] = free.map(() => []);
  free.forEach((_, i) => groups[root(i)].push(i));
  for (const group of groups) {
    if (group.length === 1) solveLone(free[group[0]], touching[group[0]], volts);
    else if (group.length === 2)
      solvePair(free[group[0]], free[group[1]], touching[group[0]], touching[group[1]], volts);
    else if (group.length > 2) solveGroup(group, free, touching, localOf, volts);
  }
}

function solveLone(net: number, stamps: readonly Stamp[], volts: Float64Array): void {
  let weighted = 0;
  let total = 0;
  for (const s of stamps) {
    weighted += s.g * volts[s.a === net ? s.b : s.a];
    total += s.g;
  }
  volts[net] = total > 0 ? weighted / total : 0;
}

/** Two coupled nets: [gx+gxy, −gxy; −gxy, gy+gxy]·v = b solved by Cramer's rule. */
function solvePair(
  x: number,
  y: number,
  atX: readonly Stamp[],
  atY: readonly Stamp[],
  volts: Float64Array,
): void {
  let gx = 0;
  let gy = 0;
  let gxy = 0;
  let bx = 0;
  let by = 0;
  for (const s of atX) {
    const other = s.a === x ? s.b : s.a;
    if (other === y) gxy += s.g;
    else {
      gx += s.g;
      bx += s.g * volts[other];
    }
  }
  for (const s of atY) {
    const other = s.a === y ? s.b : s.a;
    if (other === x) continue; // counted from x's side
    gy += s.g;
    by += s.g * volts[other];
  }
  const det = (gx + gxy) * (gy + gxy) - gxy * gxy;
  volts[x] = det > 0 ? (bx * (gy + gxy) + gxy * by) / det : 0;
  volts[y] = det > 0 ? (by * (gx + gxy) + gxy * bx) / det : 0;
}

function solveGroup(
  group: readonly number[],
  free: readonly number[],
  touching: readonly Stamp[][],
  localOf: Int32Array,
  volts: Float64Array,
): void {
  const position = new Map(group.map((local, p) => [local, p]));
  const g = Matrix.zeros(group.length, group.length);
  const b = Matrix.zeros(group.length, 1);
  group.forEach((local, p) => {
    const net = free[local];
    for (const s of touching[local]) {
      const other = s.a === net ? s.b : s.a;
      g.set(p, p, g.get(p, p) + s.g);
      const q = localOf[other] >= 0 ? position.get(localOf[other]) : undefined;
      if (q === undefined) b.set(p, 0, b.get(p, 0) + s.g * volts[other]);
      else g.set(p, q, g.get(p, q) - s.g);
    }
  });
  // A group tied to nothing fixed is singular; a negligible conductance to 0 V keeps it defined.
  for (let p = 0; p < group.length; p++) g.set(p, p, g.get(p, p) + 1e-30);
  const x = new LuDecomposition(g).solve(b);
  group.forEach((local, p) => (volts[free[local]] = x.get(p, 0)));
}
