import { mosSpec } from './mos.ts';

/** NMOS: drain at the top, source at the bottom, as it sits in a pull-down network. */
export const NMOS_SPEC = mosSpec('nmos');
