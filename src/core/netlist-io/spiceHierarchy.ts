/**
 * Sizes a netlist's hierarchy before anything is expanded (docs/semantics.md §7), with the one walk
 * the design flattener uses too (`core/hierarchy/sizing.ts`): a subcircuit past the limits, or one
 * that instantiates itself, is refused at once, naming the chain of subcircuits that makes it so.
 */
import type { Body, SpiceFile } from './spiceParse.ts';
import { SpiceImportError } from './spiceErrors.ts';
import { HierarchySizer, type Placement } from '../hierarchy/sizing.ts';

export { MAX_DEPTH, MAX_FLAT_DEVICES } from '../hierarchy/sizing.ts';

export class Hierarchy {
  private readonly sizer: HierarchySizer<Body>;
  /** Each body's name: a subcircuit's own, or the cell name it was checked under (the flat top). */
  private readonly names: Map<Body, string>;

  constructor(
    file: SpiceFile,
    private readonly fileName: string,
  ) {
    const names = new Map<Body, string>(file.subckts.map((s) => [s, s.name]));
    this.names = names;
    this.sizer = new HierarchySizer<Body>({
      noun: 'subcircuit',
      nameOf: (body) => names.get(body) ?? 'top level',
      ownDevices: (body) => body.elements.filter((e) => e.kind !== 'source' && e.kind !== 'instance').length,
      placements: (body) =>
        body.elements.flatMap((e): Placement<Body>[] =>
          e.kind === 'instance'
            ? [{ name: e.name, line: e.line, child: file.subcktByName.get(e.subckt.toLowerCase()) }]
            : [],
        ),
    });
  }

  /** Devices the body flattens to (stand-ins count one each); NaN when it cannot be flattened. */
  deviceCount(body: Body): number {
    return this.sizer.deviceCount(body);
  }

  /** Throws when the body cannot be flattened: a cycle, or past a limit. */
  check(name: string, body: Body, line: number): void {
    if (!this.names.has(body)) this.names.set(body, name);
    const problem = this.sizer.problem(body);
    if (problem !== null) throw new SpiceImportError(this.fileName, problem.line ?? line, problem.message);
  }
}
