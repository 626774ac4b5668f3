#!/usr/bin/env node
// The railwise command. Runs the bundle in dist-cli/ (built by `npm install` through the `prepare`
// script, see bin/build-cli.mjs) when it is newer than every source it was built from; otherwise it
// loads the TypeScript sources through tsx, which is slower to start but always current.
import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';

const root = path.join(import.meta.dirname, '..');
const bundle = path.join(root, 'dist-cli', 'main.mjs');

function newestSource() {
  let newest = statSync(path.join(root, 'package-lock.json'), { throwIfNoEntry: false })?.mtimeMs ?? 0;
  for (const dir of ['src/core', 'src/cli']) {
    for (const entry of readdirSync(path.join(root, dir), { recursive: true, withFileTypes: true })) {
      if (entry.isFile())
        newest = Math.max(newest, statSync(path.join(entry.parentPath, entry.name)).mtimeMs);
    }
  }
  return newest;
}

async function loadCli() {
  if (
    process.env.RAILWISE_FROM_SOURCE !== '1' &&
    existsSync(bundle) &&
    statSync(bundle).mtimeMs >= newestSource()
  )
    return import(bundle);
  const { register } = await import('tsx/esm/api');
  register();
  return import('../src/cli/main.ts');
}

// Piping into a pager or `head` closes stdout early; that is not an error worth a stack trace.
process.stdout.on('error', (e) => {
  if (e.code !== 'EPIPE') throw e;
});
const { run } = await loadCli();
try {
  process.exitCode = await run(process.argv.slice(2));
} catch (e) {
  process.stderr.write(
    `railwise: internal error (please report it): ${e instanceof Error ? e.stack : String(e)}\n`,
  );
  process.exitCode = 2;
}
