#!/usr/bin/env node
// Bundles the command line (src/cli/main.ts and its worker-thread entry) into dist-cli/, so that
// `railwise` starts without compiling TypeScript on every run. Runs as the package's `prepare` step
// (so `npm install` and `npm ci` build it); bin/railwise.mjs falls back to tsx when the bundle is
// missing or older than the sources.
import { build } from 'esbuild';
import { mkdtempSync, renameSync, rmSync } from 'node:fs';
import path from 'node:path';

const root = path.join(import.meta.dirname, '..');
const target = path.join(root, 'dist-cli');
// Build beside the target and rename, so a command started meanwhile never reads half a file.
const staging = mkdtempSync(path.join(root, '.dist-cli-'));
try {
  await build({
    absWorkingDir: root,
    entryPoints: { main: 'src/cli/main.ts', cellWorker: 'src/cli/cellWorker.ts' },
    outdir: staging,
    outExtension: { '.js': '.mjs' },
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    logLevel: 'warning',
    // Dependencies published as CommonJS call require(); give the ES module bundle one.
    banner: {
      js: "import { createRequire } from 'node:module'; const require = createRequire(import.meta.url);",
    },
  });
  rmSync(target, { recursive: true, force: true });
  renameSync(staging, target);
} finally {
  rmSync(staging, { recursive: true, force: true });
}
