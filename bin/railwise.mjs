#!/usr/bin/env node
// The railwise command: runs the TypeScript CLI through tsx, so no build step is needed after install.
import { register } from 'tsx/esm/api';

register();
// Piping into a pager or `head` closes stdout early; that is not an error worth a stack trace.
process.stdout.on('error', (e) => {
  if (e.code !== 'EPIPE') throw e;
});
const { run } = await import('../src/cli/main.ts');
try {
  process.exitCode = await run(process.argv.slice(2));
} catch (e) {
  process.stderr.write(
    `railwise: internal error (please report it): ${e instanceof Error ? e.stack : String(e)}\n`,
  );
  process.exitCode = 2;
}
