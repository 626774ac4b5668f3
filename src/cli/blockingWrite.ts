/**
 * Standard output written synchronously, waiting while the reader catches up. `process.stdout.write`
 * to a pipe queues in memory whatever the reader has not taken yet, so a report of hundreds of
 * megabytes piped into a slower program was held almost whole (1.2 GB for a 65,536-vector `--json`);
 * writing through the descriptor and pausing on EAGAIN keeps at most one chunk in memory.
 */
import { writeSync } from 'node:fs';

/** Milliseconds to wait for the reader when the pipe is full. */
const PAUSE_MS = 1;

const pause = new Int32Array(new SharedArrayBuffer(4));

export class BlockingWriter {
  /** The reader went away (EPIPE, as with `| head`): the rest is dropped, as a console drops it. */
  private closed = false;

  constructor(private readonly fd: number) {}

  write(text: string): void {
    if (this.closed) return;
    const bytes = Buffer.from(text, 'utf8');
    let done = 0;
    while (done < bytes.length) {
      try {
        done += writeSync(this.fd, bytes, done);
      } catch (e) {
        const code = (e as NodeJS.ErrnoException).code;
        if (code === 'EPIPE') return void (this.closed = true);
        if (code !== 'EAGAIN') throw e;
        Atomics.wait(pause, 0, 0, PAUSE_MS);
      }
    }
  }
}
