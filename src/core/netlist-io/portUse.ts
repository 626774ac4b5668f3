/**
 * What each net of a subcircuit reaches, through the cells it places too: a gate, a channel (drain,
 * source or resistor end), or both. Worked out per subcircuit once, from the subcircuits it places,
 * so telling inputs from outputs needs no flattening (docs/semantics.md §6, pins).
 */
import type { Body } from './spiceParse.ts';
import type { BodyCell } from './spiceBodies.ts';

export const GATE = 1;
export const CHANNEL = 2;

/** Flags by net name, as the body spells its nets. */
export type NetUse = ReadonlyMap<string, number>;

export interface UseContext {
  readonly file: { readonly subcktByName: ReadonlyMap<string, Body> };
  readonly isGlobal: (lower: string) => boolean;
  readonly bodies: ReadonlyMap<Body, BodyCell>;
  readonly uses: Map<Body, NetUse>;
}

/**
 * The body's use of its nets. Every subcircuit it places has been read, and placed before the cells
 * that place it (so its use is known): `buildCell` finishes cells in that order.
 */
export function portUse(body: Body, read: BodyCell, ctx: UseContext): NetUse {
  const known = ctx.uses.get(body);
  if (known !== undefined) return known;
  const use = new Map<string, number>();
  const mark = (net: string, flag: number): void => void use.set(net, (use.get(net) ?? 0) | flag);
  for (const d of read.devices) {
    if (d.kind === 'nmos' || d.kind === 'pmos') {
      mark(d.gate, GATE);
      mark(d.drain, CHANNEL);
      mark(d.source, CHANNEL);
    } else if (d.kind === 'resistor') {
      mark(d.a, CHANNEL);
      mark(d.b, CHANNEL);
    }
  }
  for (const instance of read.instances) {
    const child = ctx.file.subcktByName.get(instance.cell.toLowerCase());
    const childUse = child === undefined ? undefined : ctx.uses.get(child);
    if (childUse === undefined) continue;
    for (const [pin, net] of Object.entries(instance.pins)) mark(net, childUse.get(pin) ?? 0);
    // A global net inside the placed cell that no pin wires is the net of that name here.
    for (const [net, flags] of childUse)
      if (!Object.hasOwn(instance.pins, net) && ctx.isGlobal(net.toLowerCase())) mark(net, flags);
  }
  ctx.uses.set(body, use);
  return use;
}
