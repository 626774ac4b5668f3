import { mosSpec } from './mos.ts';

/** PMOS: source at the top (towards the supply), drain at the bottom, bubble on the gate. */
export const PMOS_SPEC = mosSpec('pmos');
