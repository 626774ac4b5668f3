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
