/** The human lines of a proof (`--prove`) and of a comparison (`compare`). */
import { brief, printable } from '../core/format/printable.ts';
import { findingsAbout } from '../core/proof/properties.ts';
import { vectorText as coreVectorText } from '../core/view/proofView.ts';
import { vectorCountText } from '../core/view/vectorControl.ts';
import type { Colour } from './colour.ts';
import type { ProofJson, PropertyJson } from './proofCell.ts';

export function proofLines(proof: ProofJson, inputs: number, c: Colour): string[] {
  const failing = proof.properties.filter((p) => p.holds !== true).length;
  const head = `  proof (all ${vectorCountText(inputs)} vectors, ${proof.seconds.toFixed(2)} s): ${proof.properties.length - failing} of ${proof.properties.length} properties hold`;
  // One line per distinct reason: a latch gives every property the same one (docs/semantics.md §10).
  const reasons = [...new Set(proof.properties.flatMap((p) => (p.holds === null ? [p.reason ?? ''] : [])))];
  return [
    head,
    ...proof.properties.map((p) => propertyLine(p, c)),
    ...reasons.map((r) => c.warning(`    undecided: ${brief(r, 600)}`)),
    ...proof.notes.map((n) => c.dim(`    note: ${brief(n)}`)),
  ];
}

function propertyLine(p: PropertyJson, c: Colour): string {
  const what = `${p.property}${p.output === null ? '' : ` ${printable(p.output)}`}`;
  if (p.holds === true) return `    ${c.bold('holds  ')} ${what}`;
  if (p.holds === null) return `    ${c.warning('unknown')} ${what}`;
  const findings = p.findings ?? [];
  const first = findingsAbout(p, findings)[0] ?? findings[0];
  const because = first === undefined ? '' : `\n              ${brief(first.message, 600)}`;
  return `    ${c.error('FAILS  ')} ${what} at ${vectorText(p.vector ?? {})}${because}`;
}

/** `A=1 B=0`, the first inputs (the JSON has them all), each name made printable. */
export function vectorText(vector: Readonly<Record<string, 0 | 1>>): string {
  return coreVectorText(vector, printable);
}
