/**
 * Writes one JSON document a piece at a time, so a report of 65,536 vectors is never one string
 * (V8 caps a string near 512 MB, and holding the whole text doubles the memory). The text is what
 * `JSON.stringify(value, null, 2)` would give, except that parts of the value may be:
 * - `Stream`: an array whose items are pushed one at a time (the rows of a sweep as they are solved);
 * - `Later`: a value computed only when the writer reaches it (a summary known after the rows);
 * - `Raw`: a value already written by `JSON.stringify(value, null, 2)` (findings kept on disk);
 * - `Indented`: a value whose text its maker writes for the indent it is nested at (a sweep's rows,
 *   `rowText.ts`), pushed as one piece rather than line by line.
 * When a stream fails part way, its array is closed, the enclosing object gets an `error` field, and
 * the document is completed before the error is passed on: the output always parses.
 */

export class Stream<T> {
  constructor(readonly each: (emit: (item: T) => void) => void) {}
}

export class Later<T> {
  constructor(readonly get: () => T) {}
}

export class Raw {
  constructor(readonly json: string) {}
}

export class Indented {
  /** `text(indent)`: the value's JSON, every line after the first starting with `indent`. */
  constructor(readonly text: (indent: string) => string) {}
}

/** Lines go out in chunks of about this many characters. */
const CHUNK = 1 << 16;

/**
 * Writes `value` through `out`, which receives whole lines (without the last newline) and is
 * expected to add one newline after each call, as a console does.
 */
export function writeJson(value: unknown, out: (lines: string) => void): void {
  const writer = new Writer(out);
  writer.value(value, '', '', '');
  writer.close();
  if (writer.failure !== null) throw writer.failure;
}

class Writer {
  failure: unknown = null;
  /** A stream failed and no enclosing object has reported it yet. */
  private unreported = false;
  /** Lines not yet written; the last one stays until the next arrives, so it can still be amended. */
  private buffer: string[] = [];
  private size = 0;

  constructor(private readonly out: (lines: string) => void) {}

  /** Writes `value` with `first` before its first line and `last` after its last; `indent` is its own. */
  value(value: unknown, indent: string, first: string, last: string): void {
    if (value instanceof Later) return this.value(value.get(), indent, first, last);
    if (value instanceof Raw) return this.text(value.json, indent, first, last);
    if (value instanceof Indented) return this.push(`${first}${value.text(indent)}${last}`);
    if (value instanceof Stream) return this.stream(value, indent, first, last);
    if (typeof value !== 'object' || value === null || !hasLazyPart(value)) {
      return this.text(JSON.stringify(value, null, 2) ?? 'null', indent, first, last);
    }
    if (Array.isArray(value))
      return this.stream(new Stream((emit) => value.forEach(emit)), indent, first, last);
    this.object(value as Record<string, unknown>, indent, first, last);
  }

  close(): void {
    this.flush(0);
  }

  private text(json: string, indent: string, first: string, last: string): void {
    const lines = json.split('\n');
    lines.forEach((line, i) =>
      this.push(`${i === 0 ? first : indent}${line}${i === lines.length - 1 ? last : ''}`),
    );
  }

  private object(value: Record<string, unknown>, indent: string, first: string, last: string): void {
    const entries = Object.entries(value).filter(([, v]) => v !== undefined);
    if (entries.length === 0) return this.push(`${first}{}${last}`);
    this.push(`${first}{`);
    const inner = `${indent}  `;
    entries.forEach(([key, v], i) => {
      this.value(v, inner, `${inner}${JSON.stringify(key)}: `, i < entries.length - 1 ? ',' : '');
    });
    if (this.unreported) {
      this.unreported = false;
      this.amendLast(',');
      this.text(
        JSON.stringify({ message: failureText(this.failure) }, null, 2),
        inner,
        `${inner}"error": `,
        '',
      );
    }
    this.push(`${indent}}${last}`);
  }

  private stream(stream: Stream<unknown>, indent: string, first: string, last: string): void {
    const inner = `${indent}  `;
    let held: { item: unknown } | null = null;
    let opened = false;
    try {
      stream.each((item) => {
        if (!opened) this.push(`${first}[`);
        opened = true;
        if (held !== null) this.value(held.item, inner, inner, ',');
        held = { item };
      });
    } catch (e) {
      this.failure ??= e;
      this.unreported = true;
    }
    if (!opened) return this.push(`${first}[]${last}`);
    if (held !== null) this.value((held as { item: unknown }).item, inner, inner, '');
    this.push(`${indent}]${last}`);
  }

  private push(line: string): void {
    this.buffer.push(line);
    this.size += line.length + 1;
    if (this.size >= CHUNK) this.flush(1);
  }

  private amendLast(suffix: string): void {
    this.buffer[this.buffer.length - 1] += suffix;
  }

  /** Writes all buffered lines but the last `keep`. */
  private flush(keep: number): void {
    if (this.buffer.length <= keep) return;
    const kept = this.buffer.slice(this.buffer.length - keep);
    this.out(this.buffer.slice(0, this.buffer.length - keep).join('\n'));
    this.buffer = kept;
    this.size = kept.reduce((s, l) => s + l.length + 1, 0);
  }
}

function hasLazyPart(value: unknown): boolean {
  if (value instanceof Stream || value instanceof Later || value instanceof Raw || value instanceof Indented)
    return true;
  return typeof value === 'object' && value !== null && Object.values(value).some(hasLazyPart);
}

function failureText(e: unknown): string {
  return `internal error (please report it): ${e instanceof Error ? e.message : String(e)}`;
}
