/**
 * The zod schema of the design file, version 1. Units follow the model: W and L in µm, ohms,
 * farads, volts, amperes. Every object is a plain `z.object`, so unknown keys are dropped on load
 * rather than rejected: a file written by a newer build still opens, minus what this build cannot
 * represent.
 */
import { z } from 'zod';
import { nameRecord } from '../model/records.ts';
import { inRange, RANGES, rangeText } from '../model/ranges.ts';
import { coordinate, farads, length, ohms, quantity } from './quantity.ts';
import { DEFAULT_TECHNOLOGY, withVdd } from '../model/technology.ts';
import { sheetPartSchema } from './sheetPartSchema.ts';

const netName = z.string().min(1, 'a net name cannot be empty');
const deviceName = z.string().min(1, 'a device name cannot be empty');

/**
 * An object keyed by names (expected functions by output, step values by input). Unlike
 * `z.record`, a key such as `__proto__` is kept, in a record without a prototype, because a net
 * may be called that and dropping it would silently skip its check.
 */
export function namedRecord<T extends z.ZodType>(value: T) {
  return z.unknown().transform((raw, ctx) => {
    const out = nameRecord<z.output<T>>();
    if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
      ctx.addIssue({ code: 'custom', message: 'expected an object keyed by names' });
      return out;
    }
    for (const key of Object.keys(raw)) {
      const result = value.safeParse((raw as Record<string, unknown>)[key]);
      if (result.success) out[key] = result.data;
      else
        for (const issue of result.error.issues)
          ctx.addIssue({ ...issue, path: [key, ...issue.path] } as never);
    }
    return out;
  });
}

const mosSchema = z.object({
  kind: z.enum(['nmos', 'pmos']),
  name: deviceName,
  gate: netName,
  drain: netName,
  source: netName,
  bulk: netName.exactOptional(),
  w: length,
  l: length,
  model: z.string().min(1).exactOptional(),
});

const resistorSchema = z.object({
  kind: z.literal('resistor'),
  name: deviceName,
  a: netName,
  b: netName,
  ohms,
});

const capacitorSchema = z.object({
  kind: z.literal('capacitor'),
  name: deviceName,
  a: netName,
  b: netName,
  farads,
});

const diodeSchema = z.object({
  kind: z.literal('diode'),
  name: deviceName,
  anode: netName,
  cathode: netName,
});

export const deviceSchema = z.discriminatedUnion('kind', [
  mosSchema,
  resistorSchema,
  capacitorSchema,
  diodeSchema,
]);

/**
 * A supply may carry its own voltage; a ground is always 0 V, so a `volts` of 0 on it is dropped and
 * any other value refused (it would be silently ignored).
 */
export const railSchema = z
  .object({
    net: netName,
    role: z.enum(['supply', 'ground']),
    volts: quantity(RANGES.volts).optional(),
  })
  .superRefine((rail, ctx) => {
    if (rail.role === 'ground' && rail.volts !== undefined && rail.volts !== 0)
      ctx.addIssue({ code: 'custom', path: ['volts'], message: 'a ground rail is at 0 V; leave volts out' });
    if (rail.role === 'supply' && rail.volts !== undefined && !inRange(rail.volts, RANGES.supply))
      ctx.addIssue({ code: 'custom', path: ['volts'], message: rangeText(RANGES.supply) });
  })
  .transform(({ volts, ...rail }) =>
    volts === undefined || rail.role === 'ground' ? rail : { ...rail, volts },
  );

export const netlistSchema = z.object({
  name: z.string(),
  devices: z.array(deviceSchema),
  rails: z.array(railSchema),
  inputs: z.array(netName),
  outputs: z.array(netName),
});

/**
 * One model card's level-1 values (docs/semantics.md §1, "Model cards"): what it leaves out, the
 * technology gives. `vt0` is VTO for NMOS and −VTO for PMOS, as the technology keeps `vtp`.
 */
const deviceModelSchema = z.object({
  type: z.enum(['nmos', 'pmos']),
  vt0: quantity(RANGES.threshold).exactOptional(),
  kp: quantity(RANGES.transconductance).exactOptional(),
  gamma: quantity(RANGES.bodyEffect).exactOptional(),
  phi: quantity(RANGES.surfacePotential).exactOptional(),
  lambda: quantity(RANGES.channelModulation).exactOptional(),
});

/**
 * Each field may be left out of a hand-written file; missing ones take the textbook defaults, and
 * missing input thresholds follow the file's VDD at 0.35 and 0.65 of it (as `withVdd` does).
 */
export const technologySchema = z
  .object({
    source: z.string().default(DEFAULT_TECHNOLOGY.source),
    vdd: quantity(RANGES.supply).default(DEFAULT_TECHNOLOGY.vdd),
    rn: ohms.default(DEFAULT_TECHNOLOGY.rn),
    rp: ohms.default(DEFAULT_TECHNOLOGY.rp),
    vtn: quantity(RANGES.volts).default(DEFAULT_TECHNOLOGY.vtn),
    vtp: quantity(RANGES.volts).default(DEFAULT_TECHNOLOGY.vtp),
    vil: quantity(RANGES.volts).optional(),
    vih: quantity(RANGES.volts).optional(),
    cgPerArea: quantity(RANGES.capacitancePerArea).default(DEFAULT_TECHNOLOGY.cgPerArea),
    cdPerWidth: quantity(RANGES.capacitancePerWidth).default(DEFAULT_TECHNOLOGY.cdPerWidth),
    ioffPerWidth: quantity(RANGES.currentPerWidth).default(DEFAULT_TECHNOLOGY.ioffPerWidth),
    kpn: quantity(RANGES.transconductance).default(DEFAULT_TECHNOLOGY.kpn),
    kpp: quantity(RANGES.transconductance).default(DEFAULT_TECHNOLOGY.kpp),
    // Level-1 DC model (added after version 1 files were written, so optional with defaults).
    gamman: quantity(RANGES.bodyEffect).default(DEFAULT_TECHNOLOGY.gamman),
    gammap: quantity(RANGES.bodyEffect).default(DEFAULT_TECHNOLOGY.gammap),
    phin: quantity(RANGES.surfacePotential).default(DEFAULT_TECHNOLOGY.phin),
    phip: quantity(RANGES.surfacePotential).default(DEFAULT_TECHNOLOGY.phip),
    lambdan: quantity(RANGES.channelModulation).default(DEFAULT_TECHNOLOGY.lambdan),
    lambdap: quantity(RANGES.channelModulation).default(DEFAULT_TECHNOLOGY.lambdap),
    // Model cards the devices name (added to version 1 as an optional field).
    models: z.record(z.string().min(1), deviceModelSchema).exactOptional(),
  })
  .transform(({ vil, vih, ...t }) => {
    const { vil: lowDefault, vih: highDefault } = withVdd(DEFAULT_TECHNOLOGY, t.vdd);
    return { ...t, vil: vil ?? lowDefault, vih: vih ?? highDefault };
  })
  .refine((t) => t.vil < t.vih, { message: 'vil must be below vih', path: ['vih'] })
  .refine((t) => t.vih <= t.vdd, { message: 'vih must not exceed vdd', path: ['vih'] });

/** Hand-written files may use the numbers 0 and 1 for input values. */
const inputValueSchema = z
  .union([z.enum(['0', '1', 'X', 'Z']), z.literal(0), z.literal(1)])
  .transform((v) => (v === 0 ? '0' : v === 1 ? '1' : v));

export const sequenceSchema = z.object({
  name: z.string(),
  steps: z.array(namedRecord(inputValueSchema)),
});

const pointSchema = z.object({ x: coordinate, y: coordinate });

export const sheetSchema = z.object({
  parts: z.array(sheetPartSchema),
  wires: z.array(z.object({ id: z.string().min(1), points: z.array(pointSchema) })),
});

/** The marker that tells a Railwise design file from any other JSON. */
export const DESIGN_FORMAT_TAG = 'railwise-design';
