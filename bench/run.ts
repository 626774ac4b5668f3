// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * `npm run bench`: times the switch-level solver on generated circuits and prints a table.
 * `npm run --silent bench -- --json` also prints, as its last line, one JSON object with every figure.
 * Progress goes to stderr so stdout stays the table and the JSON line.
 */
import { compile } from '../src/core/compile/compile.ts';
import { DEFAULT_TECHNOLOGY } from '../src/core/model/technology.ts';
import { FAMILIES, MEMORY_SERIES, OVERHEAD_BITS, TOGGLE_BITS, familyNamed, sweepCircuit } from './cases.ts';
import { dcCases, type DcCaseResult } from './dc.ts';
import { floorFrame, floorLoop } from './floor.ts';
import { measureToggleWithFullPaint, measureToggleWithPaint } from './screen.ts';
import { rippleAdder } from './generators/index.ts';
import { wideAdderBank } from './generators/adderBank.ts';
import {
  measureCheckCpu,
  measureCommand,
  measureWordSweep,
  measureWordWidths,
  type CpuRow,
} from './sweepWords.ts';
import { measureMemory, withSlopes, type MemoryResult } from './memory.ts';
import {
  measureCheckSweep,
  measureEdit,
  measureRandom,
  measureSettle,
  measureSweep,
  measureToggle,
  prepare,
  type CaseResult,
} from './measure.ts';
import { formatNumber, formatTable } from './table.ts';
import { now, repeat, secondsSince } from './timing.ts';
import { measureUndrivenSweep } from './undrivenSweep.ts';
import { operand, toggleWalk } from './vectors.ts';

function progress(message: string): void {
  process.stderr.write(`bench: ${message}\n`);
}

/** Floor ns per transistor per vector, on the sweep circuit (1,792 transistors); fastest run, like the cases. */
function measureFloor(): number {
  const frame = floorFrame(compile(sweepCircuit(), DEFAULT_TECHNOLOGY));
  // Short runs (well under a scheduler time slice) so that the fastest of many is an undisturbed one.
  const vectors = 256;
  let sink = 0;
  const sample = repeat(() => (sink += floorLoop(frame, vectors)), { warmup: 20, budgetSeconds: 0.5 });
  if (sink === -1) progress('unreachable'); // keeps the checksum alive
  return (sample.best * 1e9) / (frame.gates.length * vectors);
}

/** Whole settles (incremental off): the cost of one vector with nothing carried over. */
function settleSeries(): CaseResult[] {
  return FAMILIES.flatMap((family) =>
    family.sizes.map((size) => {
      progress(`settle ${family.name} ${size} ${family.unit}`);
      return measureSettle(
        `settle/${family.name}/${size}`,
        prepare(family.make(size), { incremental: false }),
      );
    }),
  );
}

function randomSeries(): CaseResult[] {
  const largest = FAMILIES.map((f) => ({ name: f.name, netlist: f.make(f.sizes[f.sizes.length - 1]!) }));
  return [...largest, { name: 'adder-bank', netlist: sweepCircuit() }].map(({ name, netlist }) => {
    progress(`random vectors on ${netlist.name}`);
    return measureRandom(`random/${name}`, prepare(netlist));
  });
}

/** The same 13-input sweep solver-only and through checkSweep, to show what the reporting costs. */
function analysisOverhead(): CaseResult[] {
  progress(`sweep and checkSweep on a ${OVERHEAD_BITS}-bit ripple adder`);
  const netlist = rippleAdder(OVERHEAD_BITS);
  return [
    measureSweep(`sweep/ripple-adder-${OVERHEAD_BITS}`, prepare(netlist)),
    measureCheckSweep(`check-sweep/ripple-adder-${OVERHEAD_BITS}`, netlist),
  ];
}

/** A random walk of toggles, and the worst case: the carry rippling through every bit. */
function toggleCases(): CaseResult[] {
  progress(`toggle and edit on a ${TOGGLE_BITS}-bit ripple adder`);
  const p = prepare(rippleAdder(TOGGLE_BITS));
  const a = p.netlist.inputs.filter((n) => n.startsWith('A'));
  const b = p.netlist.inputs.filter((n) => n.startsWith('B'));
  // A = all ones, B = 0: flipping the carry-in flips every carry and every sum bit.
  const ripple = { ...operand(a, -1), ...operand(b, 0), CI: '0' } as const;
  return [
    measureToggle('toggle/ripple-adder-179/random-input', p, toggleWalk(p.netlist.inputs, 64)),
    measureToggle('toggle/ripple-adder-179/carry-through-all-bits', p, [ripple, { ...ripple, CI: '1' }]),
    measureToggleWithPaint(
      'toggle+paint/ripple-adder-179/random-input (CPU)',
      p.netlist,
      toggleWalk(p.netlist.inputs, 64),
    ),
    measureToggleWithFullPaint(
      'toggle+full-paint/ripple-adder-179/random-input (CPU)',
      p.netlist,
      toggleWalk(p.netlist.inputs, 64),
    ),
    measureEdit('edit/ripple-adder-179/compile-and-solve', p.netlist, ripple),
  ];
}

function memorySeries(): MemoryResult[] {
  return MEMORY_SERIES.flatMap(({ family, sizes }) =>
    withSlopes(
      sizes.map((size) => {
        progress(`memory ${family} ${size}`);
        return measureMemory(`memory/${family}/${size}`, () => familyNamed(family).make(size));
      }),
    ),
  );
}

function printTables(floorNs: number, cases: readonly CaseResult[], memory: readonly MemoryResult[]): void {
  console.log(`Railwise solver benchmark (Node ${process.version})`);
  console.log(`floor loop: ${floorNs.toFixed(3)} ns per transistor per vector\n`);
  const rows = cases.map((c) => [
    c.name + (c.extrapolated ? ' (projected)' : ''),
    c.transistors,
    c.vectors,
    c.seconds * 1e3,
    c.vectorsPerSecond,
    c.nsPerTransistorVector,
    c.nsPerTransistorVector / floorNs,
  ]);
  console.log(
    formatTable(['case', 'transistors', 'vectors', 'ms', 'vectors/s', 'ns/(T·vec)', '× floor'], rows),
  );
  console.log(
    '\nsettle, toggle and edit rows: ms for one vector; random rows: ms for a batch; both the fastest',
  );
  console.log('of repeated runs, the one least disturbed by other work (medians are in the JSON line);');
  console.log('rows marked (CPU): CPU ms per toggle, solve and paint, in the fastest batch of one walk;');
  console.log('sweep rows: total ms of wall clock; on a shared machine CPU time is the steadier figure:');
  for (const c of cases.filter((x) => x.cpuSeconds !== undefined)) {
    console.log(`  ${c.name}: ${c.seconds.toFixed(2)} s wall, ${(c.cpuSeconds ?? 0).toFixed(2)} s CPU`);
  }
  console.log('');
  const memRows = memory.map((m) => [
    m.name,
    m.transistors,
    m.bytesPerTransistor,
    m.heapBytesPerTransistor,
    m.marginalBytesPerTransistor === undefined ? '' : formatNumber(m.marginalBytesPerTransistor),
  ]);
  console.log(formatTable(['memory', 'transistors', 'bytes/T', 'JS-heap bytes/T', 'slope bytes/T'], memRows));
}

function printDc(cases: readonly DcCaseResult[]): void {
  const rows = cases.map((c) => [
    c.name,
    c.transistors,
    c.points,
    c.seconds * 1e3,
    c.cpuSecondsPerRun * 1e3,
    c.targetSeconds * 1e3,
  ]);
  console.log('');
  console.log(formatTable(['level-1 DC', 'transistors', 'points', 'ms', 'CPU ms/run', 'goal ms'], rows));
  console.log('ms: the fastest run; CPU ms/run: the average over every run, warm-up included.');
}

/** The bit-parallel sweep beside the scalar one, and the command on the bank and the 24-input bank. */
async function wordSweepRows(): Promise<CpuRow[]> {
  progress('bit-parallel sweep and check of the 16-input bank');
  const bank = sweepCircuit();
  const rows = [
    ...measureWordSweep('words/adder-bank-16-inputs', bank),
    ...measureWordWidths('words/adder-bank-16-inputs', bank),
    measureCheckCpu('check-sweep/adder-bank-16-inputs (words)', bank, true),
    measureCheckCpu('check-sweep/adder-bank-16-inputs (scalar)', bank, false),
  ];
  progress('railwise check of the 16-input bank, text, --json and --power');
  rows.push(await measureCommand('railwise check adder-bank-16-inputs', bank, []));
  rows.push(await measureCommand('railwise check --json adder-bank-16-inputs', bank, ['--json']));
  // --power counts power on every solved vector, which the bit-parallel sweep does not do yet.
  rows.push(await measureCommand('railwise check --power adder-bank-16-inputs', bank, ['--power']));
  progress('railwise check of the 24-input bank (16,777,216 vectors)');
  rows.push(
    await measureCommand('railwise check adder-bank-24-inputs', wideAdderBank(), ['--max-inputs', '24']),
  );
  return rows;
}

function printCpuRows(floorNs: number, rows: readonly CpuRow[]): void {
  const cells = rows.map((r) => [
    r.name,
    r.transistors,
    r.vectors,
    r.cpuSeconds,
    r.nsPerTransistorVector,
    floorNs / r.nsPerTransistorVector,
    r.peakMb === undefined ? '' : formatNumber(r.peakMb),
  ]);
  console.log('');
  console.log(
    formatTable(
      ['sweep (CPU)', 'transistors', 'vectors', 'CPU s', 'ns/(T·vec)', 'floor ÷ row', 'peak MB'],
      cells,
    ),
  );
  console.log('floor ÷ row: how many times below the floor loop per transistor per vector (CPU time);');
  console.log('railwise check rows: the bundled command in a child process, output read and dropped.');
}

async function main(): Promise<void> {
  const json = process.argv.includes('--json');
  const started = now();
  progress('floor loop');
  const floorNs = measureFloor();
  const cases = [...settleSeries(), ...randomSeries()];
  progress('exhaustive sweep, 65,536 vectors');
  const sweep = measureSweep('sweep/adder-bank-16-inputs', prepare(sweepCircuit()));
  cases.push(sweep, ...analysisOverhead(), ...toggleCases());
  const words = await wordSweepRows();
  progress('check sweep with undriven inputs, 6,561 vectors');
  words.push(measureUndrivenSweep());
  const memory = memorySeries();
  progress('level-1 DC: transfer curve and every-vector pass');
  const dc = dcCases();
  printTables(floorNs, cases, memory);
  printCpuRows(floorNs, words);
  printDc(dc);
  const totalSeconds = secondsSince(started);
  console.log(`\nwhole run: ${totalSeconds.toFixed(1)} s`);
  if (json) {
    const withRatio = cases.map((c) => ({ ...c, ratioToFloor: c.nsPerTransistorVector / floorNs }));
    const wordRows = words.map((r) => ({ ...r, timesBelowFloor: floorNs / r.nsPerTransistorVector }));
    const summary = {
      node: process.version,
      totalSeconds,
      sweepSeconds: sweep.seconds,
      memory,
      dc,
      words: wordRows,
    };
    console.log(JSON.stringify({ floorNsPerTransistorVector: floorNs, cases: withRatio, ...summary }));
  }
}

await main();
