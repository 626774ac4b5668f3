import type { MosKind } from './netlist.ts';

/**
 * Per-design technology settings. Units: volts, ohms, µm, farads, amperes.
 *
 * Defaults are the 0.25 µm process of Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits:
 * A Design Perspective", 2nd ed., Prentice Hall 2003 (tables 3.2 and 3.3): VDD 2.5 V, VT0 0.43 V
 * (NMOS) and −0.4 V (PMOS), k' 115 and 30 µA/V², and an equivalent on-resistance of about 13 kΩ
 * (NMOS) and 31 kΩ (PMOS) at W/L = 1. These are textbook values recalled from memory, not a foundry's.
 * The input thresholds 0.35·VDD and 0.65·VDD are the usual low-voltage CMOS input levels of the JEDEC
 * JESD8 family (from memory). Gate capacitance uses Cox ≈ 6 fF/µm² for tox ≈ 5.7 nm (RCN, from memory);
 * diffusion capacitance and off-current are round illustrative values (common practice, no source).
 * The level-1 (Shichman–Hodges) DC model reads VT0 from vtn/vtp and k' from kpn/kpp, plus the body-effect
 * coefficient γ 0.4 V^½ (both types), the surface potential 2φF 0.6 V and the channel-length modulation
 * λ 0.06 V⁻¹ (NMOS) and 0.1 V⁻¹ (PMOS) of the same RCN tables (from memory).
 */
export interface Technology {
  /** Where the values come from, shown in the UI and reports. */
  readonly source: string;
  readonly vdd: number;
  /** NMOS on-resistance at W/L = 1, ohms. A device's is rn · L / W. */
  readonly rn: number;
  /** PMOS on-resistance at W/L = 1, ohms. */
  readonly rp: number;
  readonly vtn: number;
  /** Magnitude of the PMOS threshold, volts. */
  readonly vtp: number;
  /** Highest voltage read as 0. */
  readonly vil: number;
  /** Lowest voltage read as 1. */
  readonly vih: number;
  /** Gate capacitance per channel area, F/µm². */
  readonly cgPerArea: number;
  /** Drain or source diffusion capacitance per µm of width, F/µm. */
  readonly cdPerWidth: number;
  /** Off-state (subthreshold) current per µm of width at VDD, A/µm. */
  readonly ioffPerWidth: number;
  /** Process transconductance k' = µCox, A/V² (NMOS, PMOS magnitude). */
  readonly kpn: number;
  readonly kpp: number;
  /** Body-effect coefficient γ, V^½ (NMOS, PMOS magnitude): VT = VT0 + γ(√(2φF + VSB) − √(2φF)). */
  readonly gamman: number;
  readonly gammap: number;
  /** Surface potential 2φF, volts (NMOS, PMOS magnitude); the `phi` of level-1 model cards. */
  readonly phin: number;
  readonly phip: number;
  /** Channel-length modulation λ, 1/V (NMOS, PMOS magnitude): ID grows by (1 + λ·VDS). */
  readonly lambdan: number;
  readonly lambdap: number;
  /**
   * Level-1 values of the SPICE model cards that devices name (`MosDevice.model`), by card name.
   * Absent or empty in most designs: every device then takes the fields above.
   */
  readonly models?: Readonly<Record<string, DeviceModel>>;
}

/**
 * The level-1 values one model card gives (docs/semantics.md §1, "Model cards"), in the units and
 * sign convention of the technology's own fields: `vt0` is VTO for NMOS and −VTO for PMOS (so an
 * enhancement PMOS card's −0.4 V reads 0.4, like `vtp`), `kp` A/V², `gamma` V^½, `phi` volts (2φF),
 * `lambda` 1/V. A field the card leaves out takes the technology's value for the type.
 */
export interface DeviceModel {
  readonly type: MosKind;
  readonly vt0?: number;
  readonly kp?: number;
  readonly gamma?: number;
  readonly phi?: number;
  readonly lambda?: number;
}

/** The level-1 parameters a model card can set, in the order cards are written. */
export const MODEL_FIELDS = ['vt0', 'kp', 'gamma', 'phi', 'lambda'] as const;
export type ModelField = (typeof MODEL_FIELDS)[number];

/** The technology's own value of a model field for one device type. */
export function technologyValue(tech: Technology, type: MosKind, field: ModelField): number {
  const n = type === 'nmos';
  switch (field) {
    case 'vt0':
      return n ? tech.vtn : tech.vtp;
    case 'kp':
      return n ? tech.kpn : tech.kpp;
    case 'gamma':
      return n ? tech.gamman : tech.gammap;
    case 'phi':
      return n ? tech.phin : tech.phip;
    case 'lambda':
      return n ? tech.lambdan : tech.lambdap;
  }
}

/** The card a model name stands for, or undefined (own keys only: a name like `constructor` is no card). */
export function modelCard(tech: Technology, name: string | undefined): DeviceModel | undefined {
  const models = tech.models;
  return name === undefined || models === undefined || !Object.hasOwn(models, name)
    ? undefined
    : models[name];
}

/**
 * Input thresholds as fractions of VDD: VIL = 0.35·VDD, VIH = 0.65·VDD (JESD8 family, from memory).
 * The one definition the default technology, a changed supply and the command line's --vdd use.
 */
export const VIL_FRACTION = 0.35;
export const VIH_FRACTION = 0.65;

export const TEXTBOOK_SOURCE =
  'Rabaey, Chandrakasan, Nikolić, Digital Integrated Circuits, 2nd ed. (2003), 0.25 µm process, tables 3.2–3.3';

export const DEFAULT_TECHNOLOGY: Technology = {
  source: TEXTBOOK_SOURCE,
  vdd: 2.5,
  rn: 13e3,
  rp: 31e3,
  vtn: 0.43,
  vtp: 0.4,
  vil: VIL_FRACTION * 2.5,
  vih: VIH_FRACTION * 2.5,
  cgPerArea: 6e-15,
  cdPerWidth: 1e-15,
  ioffPerWidth: 1e-10,
  kpn: 115e-6,
  kpp: 30e-6,
  gamman: 0.4,
  gammap: 0.4,
  phin: 0.6,
  phip: 0.6,
  lambdan: 0.06,
  lambdap: 0.1,
};

/** A technology at another supply: thresholds follow VDD as VIL_FRACTION and VIH_FRACTION. */
export function withVdd(tech: Technology, vdd: number): Technology {
  return { ...tech, vdd, vil: VIL_FRACTION * vdd, vih: VIH_FRACTION * vdd };
}

/** The technology with one card's values as its own for the card's type (the fields the card gives). */
export function withCardValues(tech: Technology, card: DeviceModel): Technology {
  const n = card.type === 'nmos';
  const set = (field: ModelField, nmosKey: keyof Technology, pmosKey: keyof Technology) =>
    card[field] === undefined ? {} : { [n ? nmosKey : pmosKey]: card[field] };
  return {
    ...tech,
    ...set('vt0', 'vtn', 'vtp'),
    ...set('kp', 'kpn', 'kpp'),
    ...set('gamma', 'gamman', 'gammap'),
    ...set('phi', 'phin', 'phip'),
    ...set('lambda', 'lambdan', 'lambdap'),
  };
}
