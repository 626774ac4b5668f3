/**
 * Standard output into a slow pipe: the command waits for the reader instead of queueing the report
 * in memory (blockingWrite.ts). A child writes 192 MB through the writer to a parent that starts
 * reading late; every byte arrives, and the child's peak memory stays far below what it wrote.
 */
import { spawn } from 'node:child_process';
import { describe, expect, it } from 'vitest';

const CHUNKS = 3072;
const CHILD = `
import { BlockingWriter } from './src/cli/blockingWrite.ts';
process.stdout.on('error', () => {}); // as bin/railwise.mjs does: the pipe is now non-blocking
const out = new BlockingWriter(process.stdout.fd);
// A new string each time, as a report's chunks are.
for (let i = 0; i < ${CHUNKS}; i++) out.write(String(i).padEnd(65535, 'x') + '\\n');
process.on('exit', () => process.stderr.write(String(process.resourceUsage().maxRSS)));
`;

describe('BlockingWriter', () => {
  it('waits for a slow reader: all output arrives and memory stays bounded', async () => {
    // A shell pipe (spawn's own stdio is a socket pair): the reader starts two seconds late, by
    // which time a queueing writer would hold everything it wrote.
    const script = `"${process.execPath}" --import tsx --input-type=module -e "$CHILD" | (sleep 2; wc -c)`;
    const child = spawn('sh', ['-c', script], {
      env: { ...process.env, CHILD },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (chunk: Buffer) => (stdout += chunk.toString()));
    child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
    const status = await new Promise((resolve) => child.on('close', resolve));
    expect(status).toBe(0);
    expect(Number(stdout.trim())).toBe(CHUNKS * 65536);
    // 192 MB written; Node itself takes about 50 MB.
    expect(Number(stderr) / 1024).toBeLessThan(150);
  }, 120_000);
});
