/**
 * Figures as the panels print them. The engineering notation itself lives in `core/units`, below
 * every folder that prints a value (sheet labels, findings, panels).
 */
import { engineering } from '../units/engineering.ts';

export { engineering } from '../units/engineering.ts';

export function formatCurrent(amperes: number): string {
  return engineering(amperes, 'A');
}

export function formatPower(watts: number): string {
  return engineering(watts, 'W');
}

/** Volts to two decimals: node voltages are read against thresholds a few tenths apart. */
export function formatVolts(volts: number | null): string {
  return volts === null || Number.isNaN(volts) ? '? V' : `${volts.toFixed(2)} V`;
}
