// Behaviour of our own link format, not published values: no source applies. The encodings used
// are gzip (RFC 1952) and base64url (RFC 4648 §5), through the platform's own streams.
import { describe, expect, it } from 'vitest';
import { parseDesignFile, serializeDesign } from '../../src/core/format/designFile.ts';
import { starterById } from '../../src/core/starters/index.ts';
import { designOfCell } from '../../src/core/hierarchy/cellDesign.ts';
import {
  decodeDesignFragment,
  designFromFragment,
  encodeDesignFragment,
  LINK_PREFIX,
  MAX_LINK_CHARS,
  MAX_LINK_DESIGN_BYTES,
  ShareLinkError,
} from '../../src/app/shareLink.ts';
import { DesignFileError } from '../../src/core/format/designFile.ts';

const latch = designOfCell(starterById('tg-d-latch')!.design);

describe('share links', () => {
  it('carry a design file and give it back unchanged', async () => {
    const text = serializeDesign(latch);
    const fragment = await encodeDesignFragment(text);
    expect(fragment.startsWith(LINK_PREFIX)).toBe(true);
    expect(fragment.slice(LINK_PREFIX.length)).toMatch(/^[A-Za-z0-9_-]+$/); // safe in an address
    expect(fragment.length).toBeLessThan(text.length); // compressed
    expect(await decodeDesignFragment(fragment)).toBe(text);
    expect(await designFromFragment(fragment)).toEqual(parseDesignFile(text, 'x'));
  });
  it('refuse a damaged or cut-short link with a ShareLinkError', async () => {
    const fragment = await encodeDesignFragment(serializeDesign(latch));
    await expect(decodeDesignFragment(fragment.slice(0, fragment.length / 2))).rejects.toBeInstanceOf(
      ShareLinkError,
    );
    await expect(decodeDesignFragment(`${LINK_PREFIX}not*base64`)).rejects.toBeInstanceOf(ShareLinkError);
    await expect(decodeDesignFragment('#other=1')).rejects.toBeInstanceOf(ShareLinkError);
  });
  it('validate what they carry like a design file, naming the link and the field', async () => {
    const fragment = await encodeDesignFragment('{"format": "railwise-design", "version": 1, "name": 3}');
    const error = await designFromFragment(fragment).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(DesignFileError);
    expect(String((error as Error).message)).toContain('shared link');
  });
});

describe('hostile share links', () => {
  const gzip = async (bytes: Uint8Array): Promise<string> => {
    const out = new Blob([bytes as BlobPart]).stream().pipeThrough(new CompressionStream('gzip'));
    const packed = new Uint8Array(await new Response(out).arrayBuffer());
    let binary = '';
    for (const b of packed) binary += String.fromCharCode(b);
    return LINK_PREFIX + btoa(binary).replaceAll('+', '-').replaceAll('/', '_').replace(/=+$/, '');
  };

  it('refuse a wire ten million grid units long, naming the link and the field', async () => {
    const doc = JSON.parse(serializeDesign(latch)) as { cells: Record<string, unknown>[] };
    const far = {
      id: 'far',
      points: [
        { x: 0, y: 0 },
        { x: 1e7, y: 0 },
      ],
    };
    (doc.cells[0] as Record<string, unknown>)['sheet'] = { parts: [], wires: [far] };
    const error = await designFromFragment(await encodeDesignFragment(JSON.stringify(doc))).catch(
      (e: unknown) => e,
    );
    expect(error).toBeInstanceOf(DesignFileError);
    expect((error as DesignFileError).field).toBe('cells[0].sheet.wires[0].points[1].x');
    expect((error as Error).message).toMatch(/^shared link: field cells\[0\]\.sheet\.wires/);
  });

  it('stop unpacking as soon as the text passes the bound (32 MB of zeros in a small link)', async () => {
    const bomb = await gzip(new Uint8Array(32 * 1024 * 1024));
    expect(bomb.length).toBeLessThan(100_000);
    const error = await decodeDesignFragment(bomb).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ShareLinkError);
    expect((error as Error).message).toContain(
      `unpacks to more than ${MAX_LINK_DESIGN_BYTES / 1024 / 1024} MB`,
    );
  });

  it('refuse an over-long link before decoding it, and never make one', async () => {
    const long = LINK_PREFIX + 'A'.repeat(MAX_LINK_CHARS + 1);
    await expect(decodeDesignFragment(long)).rejects.toThrow(/longer than/);
    const huge = 'x'.repeat(MAX_LINK_DESIGN_BYTES + 1);
    await expect(encodeDesignFragment(huge)).rejects.toBeInstanceOf(ShareLinkError);
  });
});
