import type { Sequence } from '../model/design.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import type { Sheet } from '../sheet/types.ts';

/**
 * Everything a designer saves: the circuit, its process, what it should do, and where it is drawn.
 * It lives above `core/sheet` (it holds the drawing), while the netlist, the technology and the
 * input vectors it is made of stay in `core/model`, below the sheet (DEVELOPERS.md, "Layers").
 */
export interface Design {
  readonly name: string;
  readonly technology: Technology;
  readonly netlist: Netlist;
  /** Expected function per output, as expression text (see core/expect). */
  readonly expectations: Readonly<Record<string, string>>;
  readonly sequences: readonly Sequence[];
  /** Sheet geometry for the editor; absent for netlist-only designs (the editor places them). */
  readonly sheet?: Sheet;
  readonly notes?: string;
}
