#!/usr/bin/env node
// `npm test`: unit and property tests (vitest), then the end-to-end suite (vite build + Playwright on
// Debian's chromium). Prints one closing line "N passed, N failed" and exits non-zero on any failure.
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, rmSync } from 'node:fs';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

function run(command, args, env = {}) {
  const r = spawnSync(command, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  return r.status ?? 1;
}

function readJson(file) {
  try {
    return JSON.parse(readFileSync(file, 'utf8'));
  } catch {
    return null;
  }
}

function ensureChromium() {
  if (existsSync(CHROMIUM)) return true;
  const root = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!root) {
    console.error(
      `Chromium is missing at ${CHROMIUM}; install Debian's package: apt-get install -y chromium`,
    );
    return false;
  }
  console.log('Installing Debian chromium for the browser tests…');
  run('apt-get', ['update']);
  return run('apt-get', ['install', '-y', 'chromium']) === 0 && existsSync(CHROMIUM);
}

let passed = 0;
let failed = 0;
let broken = false;

rmSync('.vitest.json', { force: true });
const unitStatus = run('npx', [
  'vitest',
  'run',
  '--reporter=default',
  '--reporter=json',
  '--outputFile=.vitest.json',
]);
const unit = readJson('.vitest.json');
if (unit) {
  passed += unit.numPassedTests;
  failed += unit.numFailedTests;
}
if (unitStatus !== 0 || !unit) broken = true;

const specs = existsSync('e2e') ? readdirSync('e2e').filter((f) => f.endsWith('.spec.ts')) : [];
if (specs.length > 0) {
  if (!ensureChromium()) {
    broken = true;
  } else if (run('npx', ['vite', 'build', '--logLevel', 'warn']) !== 0) {
    broken = true;
  } else {
    rmSync('.pw.json', { force: true });
    const e2eStatus = run('npx', ['playwright', 'test', '--reporter=list,json'], {
      PLAYWRIGHT_JSON_OUTPUT_NAME: '.pw.json',
    });
    const e2e = readJson('.pw.json');
    if (e2e) {
      passed += e2e.stats.expected;
      failed += e2e.stats.unexpected + (e2e.stats.flaky ?? 0);
    }
    if (e2eStatus !== 0 || !e2e) broken = true;
  }
}

console.log(`${passed} passed, ${failed} failed`);
process.exit(broken || failed > 0 ? 1 : 0);
