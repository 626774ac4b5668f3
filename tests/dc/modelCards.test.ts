/**
 * Model cards reach the DC answer (docs/semantics.md §1, "Model cards"; §2, "DC levels"): the
 * same inverter read with its own `.model` cards switches where the cards' k' ratio says, not where
 * the technology's defaults would put it.
 *
 * Sources: the closed-form VM is Weste & Harris, CMOS VLSI Design, 4th ed. (2011), eq. 2.50 form; the
 * default technology's k'n = 115 µA/V², k'p = 30 µA/V², VTn = 0.43 V are Rabaey, Chandrakasan & Nikolić,
 * Digital Integrated Circuits, 2nd ed. (2003), tables 3.2 and 3.3 (as src/core/model/technology.ts cites, from memory); that a stronger pull-up raises a pseudo-NMOS VOL is common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { transferCurves } from '../../src/core/dc/transfer.ts';
import { dcSweep } from '../../src/core/dc/vectorDc.ts';
import { cellsFromText, type CellJob } from '../../src/core/netlist-io/cellFiles.ts';

function job(text: string): CellJob {
  const [cell] = cellsFromText(text, 'cards.sp').cells;
  if (cell === undefined || !('job' in cell)) throw new Error(JSON.stringify(cell));
  return cell.job;
}

const deck = (cards: string): string => `.subckt inv A Y VDD GND
MP Y A VDD VDD pch W=1u L=0.5u
MN Y A GND GND nch W=1u L=0.5u
.ends
${cards}`;

/** Square-law cards (γ = λ = 0), so the hand formula holds exactly. */
const STRONG_P = deck(`.model nch nmos (level=1 vto=0.5 kp=200u gamma=0 lambda=0)
.model pch pmos (level=1 vto=-0.5 kp=200u gamma=0 lambda=0)`);

describe('an inverter with its own model cards', () => {
  it('switches at the closed-form VM of its cards', () => {
    // VM = (VTn + r(VDD − |VTp|)) / (1 + r), r = √(kp·(W/L)p / (kn·(W/L)n)): Weste & Harris, CMOS VLSI
    // Design, 4th ed. (2011), eq. 2.50 form. Equal W/L and equal k' give r = 1, so with VDD = 2.5 V
    // (the default technology) and VTn = |VTp| = 0.5 V: VM = (0.5 + 1·(2.5 − 0.5)) / 2 = 1.25 V.
    const cell = job(STRONG_P);
    const vm = transferCurves(cell.netlist, cell.technology, { input: 'A' }).curves['Y']?.vm as number;
    expect(vm).toBeCloseTo(1.25, 4);
  });

  it('moves VM the way the cards say: a PMOS as strong as the NMOS pulls it up from the default', () => {
    // Without cards the devices take the default technology (k'p/k'n = 30/115, so r ≈ 0.51 and the
    // closed form gives VM ≈ (0.43 + 0.51·2.1) / 1.51 ≈ 1.0 V): the stronger card PMOS raises VM.
    const plain = job(deck('').replace(/pch/g, 'pmos').replace(/nch/g, 'nmos'));
    const vmPlain = transferCurves(plain.netlist, plain.technology, { input: 'A' }).curves['Y']?.vm as number;
    const r = Math.sqrt(30 / 115);
    expect(Math.abs(vmPlain - (0.43 + r * 2.1) / (1 + r))).toBeLessThan(0.03);
    const cell = job(STRONG_P);
    const vmCards = transferCurves(cell.netlist, cell.technology, { input: 'A' }).curves['Y']?.vm as number;
    expect(vmCards).toBeGreaterThan(vmPlain + 0.2);
  });

  it('a stronger pull-up card raises the ratioed low of a pseudo-NMOS gate', () => {
    // Pseudo-NMOS: load PMOS with its gate grounded. Its current, and so VOL, grows with its k'.
    const pseudo = (kpLoad: string): string => `.subckt pn A Y VDD GND
MP Y GND VDD VDD pload W=1u L=0.5u
MN Y A GND GND nch W=4u L=0.5u
.ends
.model pload pmos (level=1 vto=-0.4 kp=${kpLoad})
.model nch nmos (level=1 vto=0.43 kp=115u)`;
    const low = (kp: string): number => {
      const cell = job(pseudo(kp));
      const rows = dcSweep(cell.netlist, cell.technology);
      return rows[1]?.voltages['Y'] as number;
    };
    expect(low('30u')).toBeGreaterThan(low('15u'));
    expect(low('15u')).toBeGreaterThan(0);
  });
});
