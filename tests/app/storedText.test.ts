// Our own storage format for long designs; gzip is RFC 1952 and base64 RFC 4648 (standards the
// browser implements); the sizes below are measured, not published. Sources: RFC 1952 (GZIP file
// format), RFC 4648 §4 (base64); that a cut gzip stream fails to inflate follows from RFC 1952 §2.3.1
// (the CRC32 and ISIZE trailer).
import { describe, expect, it } from 'vitest';
import { isPacked, PACK_ABOVE, packForStorage, unpackFromStorage } from '../../src/app/storedText.ts';
import { serializeDesign } from '../../src/core/format/designFile.ts';
import { designOfCell } from '../../src/core/hierarchy/cellDesign.ts';
import { longDesign } from './longDesign.ts';

describe('design text in the browser’s storage', () => {
  it('keeps a short text as it is', async () => {
    expect(await packForStorage('{"a":1}')).toBe('{"a":1}');
    expect(await unpackFromStorage('{"a":1}')).toBe('{"a":1}');
  });

  it('packs a long design to a fraction of its size and gets the same text back', async () => {
    const text = serializeDesign(designOfCell(longDesign()));
    expect(text.length).toBeGreaterThan(PACK_ABOVE);
    const stored = await packForStorage(text);
    expect(isPacked(stored)).toBe(true);
    expect(stored.length).toBeLessThan(text.length / 5);
    expect(await unpackFromStorage(stored)).toBe(text);
  });

  it('refuses a damaged packed value rather than return something else', async () => {
    const stored = await packForStorage('x'.repeat(PACK_ABOVE + 1));
    await expect(unpackFromStorage(stored.slice(0, stored.length - 12))).rejects.toThrow();
  });
});
