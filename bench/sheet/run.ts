/**
 * `npm run bench:sheet`: the app in a real browser (Debian's chromium, headless, software
 * rendering) on auto-placed imports of 1,000 and 5,000 transistors. Reports pan and zoom frame
 * times (95th percentile), a toggle to the repainted sheet, reload to a settled panel and import.
 * Builds the app first unless `--no-build`; `--json` adds one JSON line at the end; `--profile DIR`
 * writes the page's CPU profile of each import and reload to DIR. Figures from one run on a shared
 * machine: read them as ratios and orders of magnitude, not as tests.
 */
import { spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { chromium, type CDPSession, type Page } from '@playwright/test';
import { exportSpice } from '../../src/core/netlist-io/spiceExport.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { adderBank, inverterChain, rippleAdder, transistorCount } from '../generators/index.ts';
import { formatTable } from '../table.ts';
import { serveDirectory } from './serve.ts';
import {
  importStart,
  markImportStart,
  panZoomFrames,
  processCpuMs,
  profiled,
  settledAt,
  toggleTimes,
  type Batch,
} from './pageMeasures.ts';

const PORT = Number(process.env.BENCH_PORT ?? 4317);
const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
const FRAMES = 60;

/** Wall time in the page and CPU time of its renderer process (per step, over a batch), milliseconds. */
interface Pair {
  readonly wall: number;
  readonly cpu: number;
}

interface SheetFigures {
  readonly name: string;
  readonly transistors: number;
  readonly import: Pair;
  readonly reload: Pair;
  /** 95th percentile of the frames' wall times; CPU per frame over all of them. */
  readonly panP95: Pair;
  readonly zoomP95: Pair;
  readonly panMean: Pair;
  /** Median of ten toggles. */
  readonly toggle: Pair;
  readonly toggleMax: Pair;
}

function progress(message: string): void {
  process.stderr.write(`bench:sheet: ${message}\n`);
}

function percentile(values: readonly number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))] ?? Number.NaN;
}

const mean = (v: readonly number[]): number => v.reduce((a, b) => a + b, 0) / Math.max(v.length, 1);

/** A statistic of the wall times, beside the batch's CPU time per step. */
function both(b: Batch, stat: (v: readonly number[]) => number): Pair {
  return { wall: stat(b.wallMs), cpu: b.cpuMsPerStep };
}

/** Where a step's CPU profile goes, or null when not profiling. */
type ProfileFile = (step: string) => string | null;

async function importCell(
  page: Page,
  cdp: CDPSession,
  netlist: Netlist,
  profile: ProfileFile,
): Promise<Pair> {
  await markImportStart(page);
  const text = exportSpice(netlist, DEFAULT_TECHNOLOGY);
  const cpu0 = await processCpuMs(cdp);
  const done = await profiled(cdp, profile('import'), async () => {
    await page.getByTestId('open-file').setInputFiles({
      name: `${netlist.name}.sp`,
      mimeType: 'text/plain',
      buffer: Buffer.from(text),
    });
    return settledAt(page, netlist.name);
  });
  return { wall: done - (await importStart(page)), cpu: (await processCpuMs(cdp)) - cpu0 };
}

/** The app on an empty store, ready, with a session on the browser's own counters. */
async function freshPage(page: Page): Promise<CDPSession> {
  await page.goto(`http://127.0.0.1:${PORT}/`);
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await page.waitForFunction(() => window.__railwise !== undefined);
  return page.context().newCDPSession(page);
}

async function measureSheet(page: Page, netlist: Netlist, profileDir: string | null): Promise<SheetFigures> {
  const profile: ProfileFile = (step) =>
    profileDir === null ? null : join(profileDir, `${netlist.name}-${step}.cpuprofile`);
  const cdp = await freshPage(page);
  await cdp.send('Performance.enable');
  progress(`${netlist.name}: import`);
  const imported = await importCell(page, cdp, netlist, profile);
  await page.evaluate(() =>
    window.__railwise!.frame(() =>
      document.querySelector<HTMLButtonElement>('[data-command="fit"]')?.click(),
    ),
  );
  progress(`${netlist.name}: frames`);
  const frames = await panZoomFrames(page, cdp, FRAMES);
  progress(`${netlist.name}: toggles`);
  const toggles = await toggleTimes(page, cdp, 10);
  progress(`${netlist.name}: reload`);
  await page.waitForTimeout(2500); // the autosave writes once the page is idle after the last change
  const cpu0 = await processCpuMs(cdp);
  const reloadWall = await profiled(cdp, profile('reload'), async () => {
    await page.reload();
    return settledAt(page, netlist.name);
  });
  const cpu1 = await processCpuMs(cdp);
  await cdp.detach();
  const p95 = (v: readonly number[]): number => percentile(v, 0.95);
  return {
    name: netlist.name,
    transistors: transistorCount(netlist),
    import: imported,
    // A reload that moved to a new renderer process starts its counter again.
    reload: { wall: reloadWall, cpu: cpu1 >= cpu0 ? cpu1 - cpu0 : cpu1 },
    panP95: both(frames.pan, p95),
    zoomP95: both(frames.zoom, p95),
    panMean: both(frames.pan, mean),
    toggle: both(toggles, (v) => percentile(v, 0.5)),
    toggleMax: both(toggles, (v) => Math.max(...v)),
  };
}

const pair = (p: Pair): string => `${p.wall.toFixed(1)} / ${p.cpu.toFixed(1)}`;

/** The sweep table of a cell: worker time, and the page's time from the result to the first row drawn. */
interface SweepFigures {
  readonly name: string;
  readonly vectors: number;
  readonly workerMs: number;
  readonly readyMs: number;
}

async function measureSweepTable(page: Page, netlist: Netlist): Promise<SweepFigures> {
  const cdp = await freshPage(page);
  progress(`${netlist.name}: import`);
  await importCell(page, cdp, netlist, () => null);
  await cdp.detach();
  progress(`${netlist.name}: sweep of ${2 ** netlist.inputs.length} vectors`);
  await page.getByTestId('sweep-start').click();
  const done = await page.waitForFunction(
    () => (window.__railwise?.state().simulation.sweep.status === 'done' ? performance.now() : false),
    undefined,
    { polling: 'raf', timeout: 600_000 },
  );
  const doneAt = (await done.jsonValue()) as number;
  await page.locator('[data-testid="vector-row-0"]').waitFor({ timeout: 60_000 });
  const drawnAt = await page.evaluate(() => performance.now());
  const workerMs = await page.evaluate(() => {
    const sweep = window.__railwise?.state().simulation.sweep;
    return sweep?.result?.elapsedMs ?? Number.NaN;
  });
  return { name: netlist.name, vectors: 2 ** netlist.inputs.length, workerMs, readyMs: drawnAt - doneAt };
}

async function main(): Promise<void> {
  const argv = process.argv.slice(2);
  const args = new Set(argv);
  const profileAt = argv.indexOf('--profile');
  const profileDir = profileAt < 0 ? null : resolve(argv[profileAt + 1] ?? '.');
  if (profileDir !== null) mkdirSync(profileDir, { recursive: true });
  if (!args.has('--no-build')) {
    progress('building the app');
    if (spawnSync('npx', ['vite', 'build', '--logLevel', 'warn'], { stdio: 'inherit' }).status !== 0)
      throw new Error('vite build failed');
  }
  const server = await serveDirectory(resolve('dist'), PORT);
  const browser = await chromium.launch({
    executablePath: CHROMIUM,
    args: ['--no-sandbox', '--disable-gpu', '--use-gl=swiftshader', '--no-first-run'],
  });
  try {
    const page = await browser.newPage({ viewport: { width: 1400, height: 860 } });
    const cells = [
      { ...inverterChain(500), name: 'chain500' },
      { ...rippleAdder(179), name: 'adder179' },
    ];
    const sweep = await measureSweepTable(page, { ...adderBank(8), name: 'bank16' });
    console.log(
      `sweep table, ${sweep.name}: ${sweep.vectors} vectors, worker ${sweep.workerMs.toFixed(0)} ms, ` +
        `first row drawn ${sweep.readyMs.toFixed(0)} ms after the result reached the page's state (wall)`,
    );
    if (args.has('--sweep-only')) return;
    const figures: SheetFigures[] = [];
    for (const netlist of cells) figures.push(await measureSheet(page, netlist, profileDir));
    console.log(
      'milliseconds: wall time in the page / CPU time of its renderer process (per step, over the batch)',
    );
    console.log(
      formatTable(
        [
          'sheet',
          'transistors',
          'import',
          'reload',
          'pan p95',
          'zoom p95',
          'pan mean',
          'toggle',
          'toggle max',
        ],
        figures.map((f) => [
          f.name,
          f.transistors,
          pair(f.import),
          pair(f.reload),
          pair(f.panP95),
          pair(f.zoomP95),
          pair(f.panMean),
          pair(f.toggle),
          pair(f.toggleMax),
        ]),
      ),
    );
    if (args.has('--json')) console.log(JSON.stringify({ frames: FRAMES, sheets: figures, sweep }));
  } finally {
    await browser.close();
    server.close();
  }
}

await main();
