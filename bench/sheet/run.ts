/**
 * `npm run bench:sheet`: the app in a real browser (Debian's chromium, headless, software
 * rendering) on auto-placed imports of 1,000 and 5,000 transistors. Reports pan and zoom frame
 * times (95th percentile), a toggle to the repainted sheet, reload to a settled panel and import.
 * Builds the app first unless `--no-build`; `--json` adds one JSON line at the end. Figures from
 * one run on a shared machine: read them as ratios and orders of magnitude, not as tests.
 */
import { spawnSync } from 'node:child_process';
import { resolve } from 'node:path';
import { chromium, type Page } from '@playwright/test';
import { exportSpice } from '../../src/core/netlist-io/spiceExport.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { inverterChain, rippleAdder, transistorCount } from '../generators/index.ts';
import { formatTable } from '../table.ts';
import { serveDirectory } from './serve.ts';
import { importStart, markImportStart, panZoomFrames, settledAt, toggleTimes } from './pageMeasures.ts';

const PORT = Number(process.env.BENCH_PORT ?? 4317);
const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
const FRAMES = 60;

interface SheetFigures {
  readonly name: string;
  readonly transistors: number;
  readonly importMs: number;
  readonly reloadMs: number;
  readonly panP95Ms: number;
  readonly zoomP95Ms: number;
  readonly panMeanMs: number;
  readonly toggleMedianMs: number;
  readonly toggleMaxMs: number;
}

function progress(message: string): void {
  process.stderr.write(`bench:sheet: ${message}\n`);
}

function percentile(values: readonly number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))] ?? Number.NaN;
}

const mean = (v: readonly number[]): number => v.reduce((a, b) => a + b, 0) / Math.max(v.length, 1);

async function importCell(page: Page, netlist: Netlist): Promise<number> {
  await markImportStart(page);
  const text = exportSpice(netlist, DEFAULT_TECHNOLOGY);
  await page.getByTestId('open-file').setInputFiles({
    name: `${netlist.name}.sp`,
    mimeType: 'text/plain',
    buffer: Buffer.from(text),
  });
  const done = await settledAt(page, netlist.name);
  return done - (await importStart(page));
}

async function measureSheet(page: Page, netlist: Netlist): Promise<SheetFigures> {
  await page.goto(`http://127.0.0.1:${PORT}/`);
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await page.waitForFunction(() => window.__railwise !== undefined);
  progress(`${netlist.name}: import`);
  const importMs = await importCell(page, netlist);
  await page.evaluate(() =>
    window.__railwise!.frame(() =>
      document.querySelector<HTMLButtonElement>('[data-command="fit"]')?.click(),
    ),
  );
  progress(`${netlist.name}: frames`);
  const frames = await panZoomFrames(page, FRAMES);
  progress(`${netlist.name}: toggles`);
  const toggles = await toggleTimes(page, 10);
  progress(`${netlist.name}: reload`);
  await page.waitForTimeout(1500); // the autosave writes shortly after the last change
  await page.reload();
  const reloadMs = await settledAt(page, netlist.name);
  return {
    name: netlist.name,
    transistors: transistorCount(netlist),
    importMs,
    reloadMs,
    panP95Ms: percentile(frames.pan, 0.95),
    zoomP95Ms: percentile(frames.zoom, 0.95),
    panMeanMs: mean(frames.pan),
    toggleMedianMs: percentile(toggles, 0.5),
    toggleMaxMs: Math.max(...toggles),
  };
}

async function main(): Promise<void> {
  const args = new Set(process.argv.slice(2));
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
    const figures: SheetFigures[] = [];
    for (const netlist of cells) figures.push(await measureSheet(page, netlist));
    console.log(
      formatTable(
        [
          'sheet',
          'transistors',
          'import ms',
          'reload ms',
          'pan p95 ms',
          'zoom p95 ms',
          'pan mean ms',
          'toggle ms',
          'toggle max ms',
        ],
        figures.map((f) => [
          f.name,
          f.transistors,
          f.importMs,
          f.reloadMs,
          f.panP95Ms,
          f.zoomP95Ms,
          f.panMeanMs,
          f.toggleMedianMs,
          f.toggleMaxMs,
        ]),
      ),
    );
    if (args.has('--json')) console.log(JSON.stringify({ frames: FRAMES, sheets: figures }));
  } finally {
    await browser.close();
    server.close();
  }
}

await main();
