/**
 * A made-up cell library ("Tidewater"): `count` cells, each a chain of `stages` NAND2 gates
 * (4 transistors each, A through the chain, B to every stage), one cell in ten with the last
 * stage's pull-up on A missing (its output floats for A-chain 1, B 0). For the library view's
 * benchmark and end-to-end test.
 */
export function tidewaterLibrary(count: number, stages: number): string {
  const lines = ['* Tidewater test library, generated for the library view'];
  for (let c = 0; c < count; c++) {
    const broken = c % 10 === 3;
    lines.push(`.subckt tw_chain${c} A B Y vdd gnd`);
    let prev = 'A';
    for (let s = 0; s < stages; s++) {
      const out = s === stages - 1 ? 'Y' : `n${s}`;
      if (!(broken && s === stages - 1)) lines.push(`mpa${s} ${out} ${prev} vdd vdd pmos w=1u l=0.25u`);
      lines.push(`mpb${s} ${out} B vdd vdd pmos w=1u l=0.25u`);
      lines.push(`mna${s} ${out} ${prev} x${s} gnd nmos w=1u l=0.25u`);
      lines.push(`mnb${s} x${s} B gnd gnd nmos w=1u l=0.25u`);
      prev = out;
    }
    lines.push('.ends');
  }
  return `${lines.join('\n')}\n`;
}
