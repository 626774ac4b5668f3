/**
 * The nets a SPICE file names alike in every subcircuit (spiceNames.ts, `FileNets`): rails, which a
 * reader knows by name or by a file-wide `supply`/`ground` directive, and `.global` nets. A design's
 * export names each once over the whole design: a supply and a ground of one name in two cells get
 * two identifiers, and a global that shares a rail's name another, so reading the file back gives
 * every cell the rails and globals it had, and no more.
 */
import type { Cell } from '../document/design.ts';
import type { Rail } from '../model/netlist.ts';
import { exportNames, type ExportedNames } from './exportNames.ts';
import { railRoleByName, sameAs, spiceIdentifier, type FileNets } from './spiceNames.ts';

type Role = Rail['role'] | 'global';

export interface DesignFileNets extends FileNets {
  /** Identifiers for the `.global` line. */
  readonly globals: readonly string[];
}

export function designFileNets(cells: readonly Cell[]): DesignFileNets {
  const named = (role: Role): string[] => {
    const nets = cells.flatMap((c) => {
      const rails = new Set(c.netlist.rails.map((r) => r.net));
      if (role === 'global') return (c.globals ?? []).filter((g) => !rails.has(g));
      return c.netlist.rails.filter((r) => r.role === role).map((r) => r.net);
    });
    return [...new Set(nets)];
  };
  const taken: string[] = [];
  const ids = new Map<string, string>();
  for (const role of ['supply', 'ground', 'global'] as const) {
    const nets = named(role);
    const exported = exportFor(nets, role, taken);
    nets.forEach((n, i) => ids.set(`${role}:${n}`, exported.identifiers[i] as string));
    taken.push(...exported.identifiers.map(sameAs));
  }
  const globals = named('global').map((g) => ids.get(`global:${g}`) as string);
  return {
    id: (net, role) => ids.get(`${role}:${net}`) ?? spiceIdentifier(net),
    reserved: new Set(taken),
    globals,
  };
}

/** A supply may not take a ground's name (nor the reverse); a global no rail's. */
function exportFor(nets: readonly string[], role: Role, taken: readonly string[]): ExportedNames {
  return exportNames(
    nets,
    {
      legal: spiceIdentifier,
      sameAs,
      reserved: (id) => {
        const byName = railRoleByName(id);
        return byName !== null && byName !== role;
      },
    },
    taken,
  );
}
