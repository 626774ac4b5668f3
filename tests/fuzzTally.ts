/**
 * The counts a fuzz test keeps: each case ends `clean` (the input loaded), `refusal` (a clear error
 * naming the file and a line or field) or `bad` (anything else). The first bad ones are kept to
 * print. `RAILWISE_FUZZ_RUNS` set (a campaign run by hand) prints the counts.
 */
export type Outcome = 'clean' | 'refusal' | 'bad';

export interface Case {
  readonly outcome: Outcome;
  readonly why: string;
}

export const FUZZ_CAMPAIGN = process.env['RAILWISE_FUZZ_RUNS'] !== undefined;

export class Tally {
  readonly counts: Record<Outcome, number> = { clean: 0, refusal: 0, bad: 0 };
  readonly bad: string[] = [];
  add(c: Case, label: string): void {
    this.counts[c.outcome]++;
    if (c.outcome === 'bad' && this.bad.length < 5) this.bad.push(`${label}: ${c.why}`);
  }
  get runs(): number {
    return this.counts.clean + this.counts.refusal + this.counts.bad;
  }
  /** One line: `NAME: N runs, C clean, R clear refusals, B bad`. */
  line(name: string): string {
    const { clean, refusal, bad } = this.counts;
    return `${name}: ${this.runs} runs, ${clean} clean, ${refusal} clear refusals, ${bad} bad`;
  }
  /** Prints the line on a campaign run. */
  print(name: string, extra = ''): void {
    if (FUZZ_CAMPAIGN) console.log(`${this.line(name)}${extra}`, this.bad);
  }
}
