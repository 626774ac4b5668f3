/**
 * Sizes a hierarchy before anything is expanded (docs/semantics.md §7): how many devices each body
 * (a subcircuit of a netlist, or a cell of a design) flattens to and how deep it nests, found once
 * per body by an iterative walk (no recursion, so thousands of nested levels cost no stack), with
 * instantiation cycles caught on the way. The netlist importer and the design flattener both size
 * with this one walk; each wraps the problems it reports in its own error.
 */

/** Devices in one flattened cell; a million-transistor cell still checks in minutes. */
export const MAX_FLAT_DEVICES = 2_000_000;
/** Levels of nesting. */
export const MAX_DEPTH = 4096;

/** One instance inside a body: the body it places, or undefined for a stand-in counted as a device. */
export interface Placement<B> {
  readonly name: string;
  /** Where the instance is written, when it comes from a file. */
  readonly line?: number;
  readonly child: B | undefined;
}

/** What the walk needs to know of a body. */
export interface HierarchySource<B> {
  readonly nameOf: (body: B) => string;
  /** Devices the body holds itself (instances not counted). */
  readonly ownDevices: (body: B) => number;
  readonly placements: (body: B) => readonly Placement<B>[];
  /** What a body is called in messages: `subcircuit` in a netlist, `cell` in a design. */
  readonly noun: string;
}

/** Why a body cannot be flattened: a loop, or past a limit; `line` is the instance's, when known. */
export interface HierarchyProblem {
  readonly kind: 'cycle' | 'size' | 'depth';
  readonly message: string;
  readonly line?: number;
}

interface Step<B> {
  readonly placement: Placement<B>;
  readonly child: B;
}

interface Size<B> {
  readonly devices: number;
  readonly depth: number;
  /** The instance that contributes most devices, and the one that nests deepest. */
  readonly heaviest: Step<B> | null;
  readonly deepest: Step<B> | null;
  readonly problem: HierarchyProblem | null;
}

interface Frame<B> {
  readonly body: B;
  readonly via: Step<B> | null;
  readonly placements: readonly Placement<B>[];
  next: number;
  devices: number;
  depth: number;
  heaviest: Step<B> | null;
  heaviestDevices: number;
  deepest: Step<B> | null;
  problem: HierarchyProblem | null;
}

export class HierarchySizer<B> {
  private readonly sizes = new Map<B, Size<B>>();

  constructor(private readonly source: HierarchySource<B>) {}

  /** Devices the body flattens to; NaN when it cannot be flattened. */
  deviceCount(body: B): number {
    const size = this.measure(body);
    return size.problem ? NaN : size.devices;
  }

  /** Why the body cannot be flattened (a loop, a limit, a broken body inside), or null. */
  problem(body: B, limits = { devices: MAX_FLAT_DEVICES, depth: MAX_DEPTH }): HierarchyProblem | null {
    const size = this.measure(body);
    if (size.problem) return size.problem;
    const name = this.source.nameOf(body);
    if (size.devices > limits.devices) {
      const chain = this.chain(name, size, (s) => s.heaviest);
      const message = `cell ${name} would flatten to ${count(size.devices)} devices, more than the limit of ${count(limits.devices)}: ${chain}`;
      return { kind: 'size', message };
    }
    if (size.depth > limits.depth) {
      const chain = this.chain(name, size, (s) => s.deepest);
      const message = `cell ${name} nests ${count(size.depth)} levels of ${this.source.noun}s, more than the limit of ${count(limits.depth)}: ${chain}`;
      return { kind: 'depth', message };
    }
    return null;
  }

  private measure(root: B): Size<B> {
    const known = this.sizes.get(root);
    if (known !== undefined) return known;
    const stack: Frame<B>[] = [this.frame(root, null)];
    const open = new Set<B>([root]);
    let result: Size<B> | null = null;
    while (result === null) {
      const f = stack[stack.length - 1] as Frame<B>;
      const p = f.placements[f.next++];
      if (p === undefined) {
        const size = finish(f);
        this.sizes.set(f.body, size);
        open.delete(f.body);
        stack.pop();
        const parent = stack[stack.length - 1];
        if (parent === undefined) result = size;
        else add(parent, f.via as Step<B>, size);
      } else if (p.child === undefined) f.devices += 1;
      else if (open.has(p.child)) f.problem ??= this.cycle(p, p.child, stack);
      else {
        const step = { placement: p, child: p.child };
        const size = this.sizes.get(p.child);
        if (size !== undefined) add(f, step, size);
        else {
          stack.push(this.frame(p.child, step));
          open.add(p.child);
        }
      }
    }
    return result;
  }

  private frame(body: B, via: Step<B> | null): Frame<B> {
    return {
      body,
      via,
      placements: this.source.placements(body),
      next: 0,
      devices: this.source.ownDevices(body),
      depth: 0,
      heaviest: null,
      heaviestDevices: -1,
      deepest: null,
      problem: null,
    };
  }

  private cycle(p: Placement<B>, child: B, stack: readonly Frame<B>[]): HierarchyProblem {
    const from = stack.findIndex((f) => f.body === child);
    const names = stack.slice(from).map((f) => this.source.nameOf(f.via ? f.via.child : child));
    const loop = [...names, this.source.nameOf(child)].join(' → ');
    const message = `${p.name}: ${this.source.noun} ${this.source.nameOf(child)} instantiates itself (${loop})`;
    return { kind: 'cycle', message, ...(p.line === undefined ? {} : { line: p.line }) };
  }

  /** `top → X1 (mid, line 9, 4,096 devices) → X3 (leaf, 2 devices)`, at most a dozen steps. */
  private chain(name: string, size: Size<B>, pick: (s: Size<B>) => Step<B> | null): string {
    const parts = [name];
    let step = pick(size);
    while (step !== null && parts.length <= 12) {
      const inner = this.sizes.get(step.child) as Size<B>;
      const line = step.placement.line === undefined ? '' : `, line ${step.placement.line}`;
      parts.push(
        `${step.placement.name} (${this.source.nameOf(step.child)}${line}, ${count(inner.devices)} devices)`,
      );
      step = pick(inner);
    }
    return parts.join(' → ') + (step === null ? '' : ' → …');
  }
}

function add<B>(f: Frame<B>, step: Step<B>, size: Size<B>): void {
  f.devices += size.devices;
  f.problem ??= size.problem;
  if (size.devices > f.heaviestDevices) {
    f.heaviest = step;
    f.heaviestDevices = size.devices;
  }
  if (size.depth + 1 > f.depth) {
    f.depth = size.depth + 1;
    f.deepest = step;
  }
}

function finish<B>(f: Frame<B>): Size<B> {
  return {
    devices: f.devices,
    depth: f.depth,
    heaviest: f.heaviest,
    deepest: f.deepest,
    problem: f.problem,
  };
}

function count(n: number): string {
  return Number.isFinite(n) ? n.toLocaleString('en-US') : 'more than 1e308';
}
