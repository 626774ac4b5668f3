/**
 * `npm run bench:sheet:profile`: where the time of an import and of a reload of the
 * 1,000-transistor sheet goes. Builds the app without minifying (names stay readable), records
 * the page's main thread with the browser's own sampling profiler (Chrome DevTools Protocol,
 * `Profiler`), and prints the functions with the most time of their own and the largest totals
 * among ours. `--out DIR` also writes each `.cpuprofile` for a browser's developer tools.
 * One run on a shared machine: read the shares, not the milliseconds.
 */
import { spawnSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { tmpdir } from 'node:os';
import { chromium, type CDPSession, type Page } from '@playwright/test';
import { exportSpice } from '../../src/core/netlist-io/spiceExport.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { inverterChain } from '../generators/index.ts';
import { formatTable } from '../table.ts';
import { serveDirectory } from './serve.ts';
import { settledAt } from './pageMeasures.ts';
import { profileSummary, type CpuProfile } from './profileSummary.ts';

const PORT = Number(process.env.BENCH_PORT ?? 4317);
const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

type Profile = CpuProfile;

async function recorded(cdp: CDPSession, run: () => Promise<void>): Promise<Profile> {
  await cdp.send('Profiler.enable');
  await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
  await cdp.send('Profiler.start');
  await run();
  return (await cdp.send('Profiler.stop')).profile;
}

function print(title: string, profile: Profile, out: string | undefined): void {
  const summary = profileSummary(profile);
  console.log(`\n${title}: ${summary.totalMs.toFixed(0)} ms sampled, ${summary.idleMs.toFixed(0)} ms idle`);
  console.log(
    formatTable(
      ['self ms', 'function'],
      summary.self.map((r) => [r.ms.toFixed(1), r.name]),
    ),
  );
  console.log(
    formatTable(
      ['total ms', 'function'],
      summary.total.map((r) => [r.ms.toFixed(1), r.name]),
    ),
  );
  if (out !== undefined) writeFileSync(join(out, `${title}.cpuprofile`), JSON.stringify(profile));
}

async function main(): Promise<void> {
  const argv = process.argv.slice(2);
  const outAt = argv.indexOf('--out');
  const out = outAt >= 0 ? resolve(argv[outAt + 1] ?? '.') : undefined;
  if (out !== undefined) mkdirSync(out, { recursive: true });
  const dist = join(tmpdir(), `railwise-profile-${process.pid}`);
  const built = spawnSync(
    'npx',
    ['vite', 'build', '--logLevel', 'warn', '--minify', 'false', '--outDir', dist, '--emptyOutDir'],
    { stdio: 'inherit' },
  );
  if (built.status !== 0) throw new Error('vite build failed');
  const server = await serveDirectory(dist, PORT);
  const browser = await chromium.launch({
    executablePath: CHROMIUM,
    args: ['--no-sandbox', '--disable-gpu', '--use-gl=swiftshader', '--no-first-run'],
  });
  try {
    const page: Page = await browser.newPage({ viewport: { width: 1400, height: 860 } });
    const netlist = { ...inverterChain(500), name: 'chain500' };
    await page.goto(`http://127.0.0.1:${PORT}/`);
    await page.evaluate(() => localStorage.clear());
    await page.reload();
    await page.waitForFunction(() => window.__railwise !== undefined);
    const cdp = await page.context().newCDPSession(page);
    const text = exportSpice(netlist, DEFAULT_TECHNOLOGY);
    const imported = await recorded(cdp, async () => {
      await page.getByTestId('open-file').setInputFiles({
        name: 'chain500.sp',
        mimeType: 'text/plain',
        buffer: Buffer.from(text),
      });
      await settledAt(page, netlist.name);
    });
    print('import', imported, out);
    await page.waitForTimeout(2500); // the autosave writes once the page is idle
    const reloaded = await recorded(cdp, async () => {
      await page.reload();
      await settledAt(page, netlist.name);
    });
    print('reload', reloaded, out);
  } finally {
    await browser.close();
    server.close();
  }
}

await main();
