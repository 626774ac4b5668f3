/**
 * Before any test: bring the command-line bundle (dist-cli/, see bin/build-cli.mjs) up to date with
 * the sources, so tests that run the real executable test the code in the tree, bundled as users get it.
 */
import { spawnSync } from 'node:child_process';

export default function setup(): void {
  const r = spawnSync(process.execPath, ['bin/build-cli.mjs'], { encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`building the command line failed:\n${r.stderr}`);
}
