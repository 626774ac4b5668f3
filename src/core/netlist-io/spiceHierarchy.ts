/**
 * Sizes the hierarchy before anything is expanded (docs/semantics.md §7): how many devices each
 * subcircuit flattens to and how deep it nests, found once per file by an iterative walk (no
 * recursion, so 2,500 nested levels cost no stack), with instantiation cycles caught on the way.
 * A cell past the limits is refused at once, naming the chain of subcircuits that makes it big.
 */
import type { Body, SpiceFile, Subckt } from './spiceParse.ts';
import type { InstanceElement } from './spiceElements.ts';
import { SpiceImportError } from './spiceErrors.ts';

/** Devices in one flattened cell; a million-transistor cell still checks in minutes. */
export const MAX_FLAT_DEVICES = 2_000_000;
/** Levels of subcircuit nesting. */
export const MAX_DEPTH = 4096;

interface Step {
  readonly instance: InstanceElement;
  readonly sub: Subckt;
}

interface Size {
  readonly devices: number;
  readonly depth: number;
  /** The instance that contributes most devices, and the one that nests deepest. */
  readonly heaviest: Step | null;
  readonly deepest: Step | null;
  readonly error: SpiceImportError | null;
}

interface Frame {
  readonly body: Body;
  readonly via: Step | null;
  next: number;
  devices: number;
  depth: number;
  heaviest: Step | null;
  heaviestDevices: number;
  deepest: Step | null;
  error: SpiceImportError | null;
}

export class Hierarchy {
  private readonly sizes = new Map<Body, Size>();

  constructor(
    private readonly file: SpiceFile,
    private readonly fileName: string,
  ) {}

  /** Devices the body flattens to (stand-ins count one each); NaN when it cannot be flattened. */
  deviceCount(body: Body): number {
    const size = this.measure(body);
    return size.error ? NaN : size.devices;
  }

  /** Throws when the body cannot be flattened: a cycle, or past a limit. */
  check(name: string, body: Body, line: number): void {
    const size = this.measure(body);
    if (size.error) throw size.error;
    if (size.devices > MAX_FLAT_DEVICES) {
      const chain = this.chain(name, size, (s) => s.heaviest);
      throw new SpiceImportError(
        this.fileName,
        line,
        `cell ${name} would flatten to ${count(size.devices)} devices, more than the limit of ${count(MAX_FLAT_DEVICES)}: ${chain}`,
      );
    }
    if (size.depth > MAX_DEPTH) {
      const chain = this.chain(name, size, (s) => s.deepest);
      const detail = `cell ${name} nests ${count(size.depth)} levels of subcircuits, more than the limit of ${count(MAX_DEPTH)}: ${chain}`;
      throw new SpiceImportError(this.fileName, line, detail);
    }
  }

  private measure(root: Body): Size {
    const known = this.sizes.get(root);
    if (known !== undefined) return known;
    const stack: Frame[] = [frame(root, null)];
    const open = new Set<Body>([root]);
    let result: Size | null = null;
    while (result === null) {
      const f = stack[stack.length - 1] as Frame;
      const e = f.body.elements[f.next++];
      if (e === undefined) {
        const size = finish(f);
        this.sizes.set(f.body, size);
        open.delete(f.body);
        stack.pop();
        const parent = stack[stack.length - 1];
        if (parent === undefined) result = size;
        else add(parent, f.via as Step, size);
      } else if (e.kind === 'instance') {
        const sub = this.file.subcktByName.get(e.subckt.toLowerCase());
        if (sub === undefined)
          f.devices += 1; // a stand-in device, or an error when flattened
        else if (open.has(sub)) f.error ??= this.cycle(e, sub, stack);
        else {
          const size = this.sizes.get(sub);
          if (size !== undefined) add(f, { instance: e, sub }, size);
          else {
            stack.push(frame(sub, { instance: e, sub }));
            open.add(sub);
          }
        }
      } else if (e.kind !== 'source') f.devices += 1;
    }
    return result;
  }

  private cycle(e: InstanceElement, sub: Subckt, stack: readonly Frame[]): SpiceImportError {
    const from = stack.findIndex((f) => f.body === sub);
    const names = stack.slice(from).map((f) => (f.via ? f.via.sub.name : sub.name));
    const detail = `${e.name}: subcircuit ${sub.name} instantiates itself (${[...names, sub.name].join(' → ')})`;
    return new SpiceImportError(this.fileName, e.line, detail);
  }

  /** `top → X1 (mid, 4,096 devices) → X3 (leaf, 2 devices)`, at most a dozen steps. */
  private chain(name: string, size: Size, pick: (s: Size) => Step | null): string {
    const parts = [name];
    let step = pick(size);
    while (step !== null && parts.length <= 12) {
      const inner = this.sizes.get(step.sub) as Size;
      parts.push(
        `${step.instance.name} (${step.sub.name}, line ${step.instance.line}, ${count(inner.devices)} devices)`,
      );
      step = pick(inner);
    }
    return parts.join(' → ') + (step === null ? '' : ' → …');
  }
}

function frame(body: Body, via: Step | null): Frame {
  return {
    body,
    via,
    next: 0,
    devices: 0,
    depth: 0,
    heaviest: null,
    heaviestDevices: -1,
    deepest: null,
    error: null,
  };
}

function add(f: Frame, step: Step, size: Size): void {
  f.devices += size.devices;
  f.error ??= size.error;
  if (size.devices > f.heaviestDevices) {
    f.heaviest = step;
    f.heaviestDevices = size.devices;
  }
  if (size.depth + 1 > f.depth) {
    f.depth = size.depth + 1;
    f.deepest = step;
  }
}

function finish(f: Frame): Size {
  return { devices: f.devices, depth: f.depth, heaviest: f.heaviest, deepest: f.deepest, error: f.error };
}

function count(n: number): string {
  return Number.isFinite(n) ? n.toLocaleString('en-US') : 'more than 1e308';
}
