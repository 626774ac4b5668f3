/**
 * Identifiers for a Verilog export (IEEE Std 1364-2005 clause 3.7). A name that is a simple
 * identifier and no keyword is written as it is; any other becomes an escaped identifier: a
 * backslash, printable ASCII (33–126), and a terminating space (3.7.1), with every other character
 * replaced. An escaped identifier is the same name as the simple one it spells (`\mid_node ` is
 * `mid_node`, 3.7.1), and nets and instances share one name space (12.6), so uniqueness is taken
 * over both, compared without the backslash. Names that changed are listed in comments at the top.
 */
import type { Netlist } from '../model/netlist.ts';
import { netNames } from '../model/netlist.ts';
import { quoted } from '../text/printable.ts';
import { exportNames, identifierMap, MAX_IDENTIFIER_LENGTH, type IdentifierRules } from './exportNames.ts';

/** Reserved words of IEEE Std 1364-2005 (Annex B) that a net or device name might collide with. */
const KEYWORDS = new Set(
  (
    'always and assign begin buf bufif0 bufif1 case casex casez cmos deassign default defparam disable edge else end ' +
    'endcase endfunction endmodule endprimitive endspecify endtable endtask event for force forever fork function ' +
    'highz0 highz1 if ifnone initial inout input integer join large macromodule medium module nand negedge nmos nor ' +
    'not notif0 notif1 or output parameter pmos posedge primitive pull0 pull1 pulldown pullup rcmos real realtime reg ' +
    'release repeat rnmos rpmos rtran rtranif0 rtranif1 scalared small specify specparam strong0 strong1 supply0 ' +
    'supply1 table task time tran tranif0 tranif1 tri tri0 tri1 triand trior trireg vectored wait wand weak0 weak1 ' +
    'while wire wor xnor xor generate endgenerate genvar localparam signed unsigned automatic cell config design ' +
    'endconfig incdir include instance liblist library noshowcancelled pulsestyle_ondetect pulsestyle_onevent ' +
    'showcancelled use uwire'
  ).split(' '),
);

const SIMPLE = /^[A-Za-z_][A-Za-z0-9_$]*$/;

function escaped(text: string): string {
  return `\\${text} `;
}

const RULES: IdentifierRules = {
  legal: (name) => {
    const cut = name.slice(0, MAX_IDENTIFIER_LENGTH);
    if (SIMPLE.test(cut) && !KEYWORDS.has(cut)) return cut;
    return escaped(cut.replace(/[^\x21-\x7e]/g, '_') || '_');
  },
  numbered: (base, n) => (base.startsWith('\\') ? escaped(`${base.slice(1, -1)}_${n}`) : `${base}_${n}`),
  sameAs: (id) => (id.startsWith('\\') ? id.slice(1).trimEnd() : id),
  reserved: () => false,
};

/** A simple identifier when the name is one (3.7), otherwise an escaped identifier (3.7.1). */
export function identifier(name: string): string {
  return RULES.legal(name);
}

export interface VerilogNames {
  readonly module: string;
  readonly net: (name: string) => string;
  /** Instance name of the device at this index. */
  readonly instance: (index: number) => string;
  /** Instance name of the placed cell at this index (`VerilogNameOptions.placements`). */
  readonly placement: (index: number) => string;
  /** `// name …` lines for every name that changed. */
  readonly comments: readonly string[];
}

export interface VerilogNameOptions {
  /** Nets besides the netlist's own (those only the instances of other modules wire). */
  readonly extraNets?: readonly string[];
  /** Names of the instances of other modules, in the name space of nets and primitives. */
  readonly placements?: readonly string[];
  /** The module's identifier, when the caller gives every cell of a design one of its own. */
  readonly module?: string;
}

export function verilogNames(netlist: Netlist, options: VerilogNameOptions = {}): VerilogNames {
  const nets = [...new Set([...netNames(netlist), ...(options.extraNets ?? [])])];
  const exportedNets = exportNames(nets, RULES);
  const netOf = identifierMap(nets, exportedNets);
  // Capacitors and diodes are written as comments: only primitives take instance names.
  const primitives = netlist.devices.flatMap((d, i) =>
    d.kind === 'capacitor' || d.kind === 'diode' ? [] : [i],
  );
  const placements = options.placements ?? [];
  const instances = exportNames(
    [...primitives.map((i) => netlist.devices[i]?.name ?? ''), ...placements],
    RULES,
    exportedNets.identifiers.map(RULES.sameAs),
  );
  const instanceOf = new Map(primitives.map((i, k) => [i, instances.identifiers[k] as string]));
  const module = options.module ?? (verilogModuleNames([netlist.name])[0] as string);
  const moduleRenamed = module === (netlist.name || 'cell') ? [] : [[netlist.name, module] as const];
  const line = (what: string, [original, id]: readonly [string, string]): string =>
    `// name ${what} ${id} = ${quoted(original)}`;
  return {
    module,
    net: (name) => netOf.get(name) ?? RULES.legal(name),
    instance: (index) => instanceOf.get(index) ?? '',
    placement: (index) => instances.identifiers[primitives.length + index] as string,
    comments: [
      ...moduleRenamed.map((r) => line('module', r)),
      ...exportedNets.renamed.map((r) => line('net', r)),
      ...instances.renamed.map((r) => line('instance', r)),
    ],
  };
}

/** Module identifiers for the cells of a design, distinct under the rules of clause 3.7. */
export function verilogModuleNames(names: readonly string[]): readonly string[] {
  return exportNames(
    names.map((n) => n || 'cell'),
    RULES,
  ).identifiers;
}
