/**
 * Holds the findings of a streamed sweep until the report reaches its `findings` list, written as
 * JSON text. Past a few megabytes the text goes to a temporary file, so a sweep whose every vector
 * has findings keeps a bounded amount in memory; the file is removed when it has been read back.
 */
import { closeSync, mkdtempSync, openSync, readSync, rmSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { StringDecoder } from 'node:string_decoder';
import { Raw } from './jsonWriter.ts';

/** In-memory text beyond which findings go to disk. */
const IN_MEMORY_CHARS = 4 << 20;

export class FindingSpool {
  constructor(private readonly inMemoryChars = IN_MEMORY_CHARS) {}

  private memory: string[] = [];
  private chars = 0;
  private file: { dir: string; fd: number } | null = null;
  count = 0;

  add(finding: object): void {
    // Compact JSON never holds a raw line break, so one line is one finding.
    const line = JSON.stringify(finding);
    this.count++;
    this.memory.push(line);
    this.chars += line.length;
    if (this.chars >= this.inMemoryChars) this.spill();
  }

  /** Every finding in order, each as the writer's Raw text; then the spool is empty. */
  replay(emit: (finding: Raw) => void): void {
    const pretty = (line: string): Raw => new Raw(JSON.stringify(JSON.parse(line), null, 2));
    if (this.file !== null) {
      this.spill();
      readLines(this.file.fd, (line) => emit(pretty(line)));
      this.dispose();
    }
    this.memory.forEach((line) => emit(pretty(line)));
    this.memory = [];
  }

  dispose(): void {
    if (this.file === null) return;
    closeSync(this.file.fd);
    rmSync(this.file.dir, { recursive: true, force: true });
    this.file = null;
  }

  private spill(): void {
    this.file ??= openSpool();
    if (this.memory.length > 0) writeSync(this.file.fd, `${this.memory.join('\n')}\n`);
    this.memory = [];
    this.chars = 0;
  }
}

function openSpool(): { dir: string; fd: number } {
  const dir = mkdtempSync(join(tmpdir(), 'railwise-findings-'));
  return { dir, fd: openSync(join(dir, 'findings.jsonl'), 'w+') };
}

/** Reads a file of lines from the start in 64 KB pieces (a character split between pieces is kept whole). */
function readLines(fd: number, each: (line: string) => void): void {
  const buffer = Buffer.alloc(1 << 16);
  const decoder = new StringDecoder('utf8');
  let position = 0;
  let rest = '';
  for (;;) {
    const n = readSync(fd, buffer, 0, buffer.length, position);
    if (n === 0) break;
    position += n;
    const text = rest + decoder.write(buffer.subarray(0, n));
    const lines = text.split('\n');
    rest = lines.pop() ?? '';
    lines.forEach(each);
  }
  if (rest !== '') each(rest);
}
