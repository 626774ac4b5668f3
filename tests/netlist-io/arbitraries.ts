/** fast-check generators of netlists whose names SPICE can carry (no white space, distinct ignoring case). */
import fc from 'fast-check';
import { HOSTILE_NAMES, RAIL_LIKE_NAMES } from '../fixtures/hostileNames.ts';
import type { Device, Netlist, Rail } from '../../src/core/model/netlist.ts';
import { netNames } from '../../src/core/model/netlist.ts';
import type { Cell, Design } from '../../src/core/document/design.ts';
import { recordOf } from '../../src/core/model/records.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { cellPins } from '../../src/core/hierarchy/cellNets.ts';

const SIGNALS = ['A', 'B', 'C', 'EN', 'Y', 'Q', 'QB', 'n1', 'n2', 'mid', 'X1/n3', 'bit_7'];
const RAIL_CHOICES: readonly Rail[] = [
  { net: 'VDD', role: 'supply' },
  { net: 'GND', role: 'ground' },
  { net: 'VPWR', role: 'supply', volts: 1.8 },
  { net: 'VGND', role: 'ground' },
  { net: 'vcc!', role: 'supply' },
];

const width = fc.double({ min: 0.05, max: 500, noNaN: true, noDefaultInfinity: true });
const ohms = fc.double({ min: 1, max: 1e9, noNaN: true, noDefaultInfinity: true });
const farads = fc.double({ min: 1e-18, max: 1e-9, noNaN: true, noDefaultInfinity: true });

function deviceArb(nets: readonly string[], index: number): fc.Arbitrary<Device> {
  const net = fc.constantFrom(...nets);
  const mos = fc.record({
    kind: fc.constantFrom('nmos' as const, 'pmos' as const),
    gate: net,
    drain: net,
    source: net,
    bulk: net,
    w: width,
    l: width,
  });
  return fc.oneof(
    mos.map((m) => ({ ...m, name: `M${index}` })),
    fc.record({ a: net, b: net, ohms }).map((r) => ({ kind: 'resistor' as const, name: `R${index}`, ...r })),
    fc
      .record({ a: net, b: net, farads })
      .map((c) => ({ kind: 'capacitor' as const, name: `C${index}`, ...c })),
    fc.record({ anode: net, cathode: net }).map((d) => ({ kind: 'diode' as const, name: `D${index}`, ...d })),
  );
}

export const netlistArb: fc.Arbitrary<Netlist> = fc
  .record({
    rails: fc
      .subarray(RAIL_CHOICES.slice(2), { minLength: 0 })
      .map((extra) => [RAIL_CHOICES[0], RAIL_CHOICES[1], ...extra] as Rail[]),
    pins: fc.shuffledSubarray(SIGNALS, { minLength: 0, maxLength: 6 }),
    split: fc.nat(6),
    deviceCount: fc.integer({ min: 0, max: 12 }),
  })
  .chain(({ rails, pins, split, deviceCount }) => {
    const nets = [...rails.map((r) => r.net), ...SIGNALS];
    const devices = fc.tuple(...Array.from({ length: deviceCount }, (_, i) => deviceArb(nets, i + 1)));
    return devices.map((ds) => ({
      name: 'cell_under_test',
      devices: ds,
      rails,
      inputs: pins.slice(0, split),
      outputs: pins.slice(split),
    }));
  });

/**
 * Netlists as any design may hold them: hostile names for the cell, nets, rails and devices
 * (repeats included), rails named like the other role, devices with and without a bulk, supplies at
 * their own voltage with or without a ground, nets that are both input and output, observed rails.
 * Only what a design file refuses is left out (an input that is a rail, a pin listed twice).
 */
export const hostileNetlistArb: fc.Arbitrary<Netlist> = fc
  .record({
    name: fc.oneof(fc.constantFrom('', ...HOSTILE_NAMES), fc.string()),
    pool: fc.shuffledSubarray([...new Set([...HOSTILE_NAMES, ...RAIL_LIKE_NAMES, ...SIGNALS])], {
      minLength: 3,
      maxLength: 12,
    }),
    railCount: fc.integer({ min: 0, max: 3 }),
    railRoles: fc.array(fc.constantFrom('supply', 'ground'), { minLength: 3, maxLength: 3 }),
    railVolts: fc.array(fc.option(fc.constantFrom(1.2, 1.8, 3.3), { nil: undefined }), {
      minLength: 3,
      maxLength: 3,
    }),
    inputCount: fc.nat(4),
    outputPicks: fc.array(fc.nat(20), { maxLength: 4 }),
    deviceCount: fc.integer({ min: 0, max: 8 }),
  })
  .chain((p) => {
    const rails: Rail[] = p.pool.slice(0, p.railCount).map((net, i) => {
      const role = p.railRoles[i] as Rail['role'];
      const volts = role === 'supply' ? p.railVolts[i] : undefined;
      return volts === undefined ? { net, role } : { net, role, volts };
    });
    const signals = p.pool.slice(p.railCount);
    const inputs = signals.slice(0, p.inputCount);
    // Outputs may repeat an input (a bidirectional pin) or be a rail (an observed rail).
    const outputs = [...new Set(p.outputPicks.map((k) => p.pool[k % p.pool.length] as string))];
    const nets = p.pool;
    const devices = fc.tuple(
      ...Array.from({ length: p.deviceCount }, (_, i) =>
        fc.tuple(deviceArb(nets, i + 1), fc.constantFrom(...HOSTILE_NAMES, `D${i}`), fc.boolean()),
      ),
    );
    return devices.map((ds): Netlist => ({
      name: p.name,
      devices: ds.map(([d, name, keepBulk]) => withoutBulk({ ...d, name }, keepBulk)),
      rails,
      inputs,
      outputs,
    }));
  });

function withoutBulk(d: Device, keep: boolean): Device {
  if (keep || (d.kind !== 'nmos' && d.kind !== 'pmos')) return d;
  const copy = { ...d };
  delete copy.bulk;
  return copy;
}

const cellNameArb = fc.oneof(fc.constantFrom(...HOSTILE_NAMES), fc.string({ minLength: 1 }));

/**
 * Designs of two to four cells as a designer may save them, with hostile names everywhere: cell
 * names (distinct, but `a` and `A` both), nets, devices, instances (repeats included) and pins. A
 * cell places earlier cells only (no loops); each instance wires some of the placed cell's pins to
 * nets of its own and leaves the others unwired (an open pin, or a rail joined by name); some
 * transistors name the technology's model cards.
 */
export const hostileDesignArb: fc.Arbitrary<Design> = fc
  .uniqueArray(cellNameArb, { minLength: 2, maxLength: 4 })
  .chain((names) =>
    fc.tuple(
      ...names.map((name, k) =>
        fc
          .record({
            netlist: hostileNetlistArb,
            places: fc.array(
              fc.record({
                cell: fc.nat(Math.max(0, k - 1)),
                name: fc.constantFrom(...HOSTILE_NAMES, `X${k}`),
                wiring: fc.array(fc.option(fc.nat(30), { nil: undefined }), { maxLength: 8 }),
              }),
              { maxLength: k === 0 ? 0 : 3 },
            ),
            cards: fc.array(fc.boolean(), { minLength: 8, maxLength: 8 }),
            expect: fc.option(fc.constantFrom('!A', 'x\n.end', '"q"', ' A & B '), { nil: undefined }),
          })
          .map((p) => ({ name, ...p })),
      ),
    ),
  )
  .map((parts): Design => {
    const cells: Cell[] = [];
    for (const p of parts) {
      const devices = p.netlist.devices.map((d, i) =>
        (d.kind === 'nmos' || d.kind === 'pmos') && p.cards[i] === true
          ? { ...d, model: d.kind === 'nmos' ? 'hvt' : 'lvt' }
          : d,
      );
      const netlist = { ...p.netlist, name: p.name, devices };
      const pool = [...new Set([...HOSTILE_NAMES.slice(0, 12), ...netNames(netlist)])];
      const instances = p.places.map((x) => {
        const placed = cells[x.cell] as Cell;
        const pins = cellPins(placed.netlist);
        const wired = pins.flatMap((pin, j) => {
          const at = x.wiring[j];
          return at === undefined ? [] : [[pin, pool[at % pool.length] as string] as const];
        });
        return { name: x.name, cell: placed.name, pins: recordOf(wired) };
      });
      const first = netlist.outputs[0];
      const expectations = recordOf(first === undefined || p.expect === undefined ? [] : [[first, p.expect]]);
      cells.push({ name: p.name, netlist, instances, expectations, sequences: [] });
    }
    const technology = {
      ...DEFAULT_TECHNOLOGY,
      models: { hvt: { type: 'nmos' as const, vt0: 0.55 }, lvt: { type: 'pmos' as const, kp: 40e-6 } },
    };
    return { name: 'hostile design', technology, cells, open: (cells.at(-1) as Cell).name };
  });
