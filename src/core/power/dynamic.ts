/**
 * Switching energy and power. Charging a capacitance C from the low level to the high level through
 * the pull-up draws the charge C·swing from a supply at VDD, so the supply delivers C·VDD·swing; for a
 * full swing that is C·VDD², half stored on the node and half dissipated in the pull-up (the stored
 * half is dissipated in the pull-down on the 1→0 transition). Weste & Harris, 4th ed., ch. 5.
 */

/** Energy drawn from the supply per 0→1 transition, joules. */
export function switchingEnergy(capacitance: number, vdd: number, swing: number = vdd): number {
  return capacitance * vdd * swing;
}

/** Dynamic power P = α·C·VDD·swing·f (α·C·VDD²·f at full swing), watts. */
export function dynamicPower(
  activity: number,
  capacitance: number,
  vdd: number,
  frequency: number,
  swing: number = vdd,
): number {
  return activity * switchingEnergy(capacitance, vdd, swing) * frequency;
}
