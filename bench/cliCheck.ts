/**
 * `railwise check` as a user runs it: the bundled command in a process of its own, its standard
 * output read and thrown away, on a cell written as a SPICE file. Reports the child's CPU time
 * (user + system) and peak resident memory, read by the child itself on exit (rusageOnExit.mjs).
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Netlist } from '../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../src/core/model/technology.ts';
import { exportSpice } from '../src/core/netlist-io/spiceExport.ts';

export interface CliResult {
  readonly name: string;
  readonly transistors: number;
  readonly vectors: number;
  readonly cpuSeconds: number;
  readonly peakMb: number;
  readonly outputMb: number;
  readonly status: number;
}

const root = join(import.meta.dirname, '..');

/** Runs `railwise check FILE ...args` on `netlist`; build the bundle first (npm run build:cli), else the command loads its sources through tsx. */
export async function measureCheck(
  name: string,
  netlist: Netlist,
  args: readonly string[],
): Promise<CliResult> {
  const dir = mkdtempSync(join(tmpdir(), 'railwise-bench-'));
  try {
    const file = join(dir, `${netlist.name}.sp`);
    writeFileSync(file, exportSpice(netlist, DEFAULT_TECHNOLOGY));
    const argv = ['--import', join(root, 'bench/rusageOnExit.mjs'), join(root, 'bin/railwise.mjs')];
    const { status, stderr, outputBytes } = await run([...argv, 'check', file, ...args]);
    const line = /RUSAGE (\{.*\})/.exec(stderr)?.[1];
    if (line === undefined) throw new Error(`${name}: the command left no usage line: ${stderr.slice(-500)}`);
    const u = JSON.parse(line) as { userUs: number; systemUs: number; maxRssKb: number };
    return {
      name,
      transistors: netlist.devices.length,
      vectors: 2 ** netlist.inputs.length,
      cpuSeconds: (u.userUs + u.systemUs) / 1e6,
      peakMb: u.maxRssKb / 1024,
      outputMb: outputBytes / 2 ** 20,
      status,
    };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function run(argv: readonly string[]): Promise<{ status: number; stderr: string; outputBytes: number }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, argv, { cwd: root, stdio: ['ignore', 'pipe', 'pipe'] });
    let outputBytes = 0;
    let stderr = '';
    child.stdout.on('data', (chunk: Buffer) => (outputBytes += chunk.length));
    child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
    child.on('error', reject);
    child.on('close', (code) => resolve({ status: code ?? -1, stderr, outputBytes }));
  });
}
