/**
 * Design text as the browser's storage keeps it: as it is when short, gzip-compressed and base64
 * encoded (behind a mark) when long. A 5,000-transistor design is about 2.4 million characters of
 * JSON without whitespace (4.7 million indented), near what a site may keep in localStorage;
 * packed it is about an eighth of that. Compression and expansion run in the browser's stream
 * machinery.
 */

/** Text that starts with this is packed: the rest is base64 of gzip. */
export const PACKED_MARK = 'railwise-packed:gzip;base64,';
/** Texts longer than this are packed. */
export const PACK_ABOVE = 200_000;

async function through(
  bytes: Uint8Array,
  stream: CompressionStream | DecompressionStream,
): Promise<Uint8Array> {
  const out = new Blob([bytes as BlobPart]).stream().pipeThrough(stream);
  return new Uint8Array(await new Response(out).arrayBuffer());
}

/** Base64 in slices, so a long text never builds one argument list too large for the engine. */
function toBase64(bytes: Uint8Array): string {
  const parts: string[] = [];
  for (let i = 0; i < bytes.length; i += 0x8000)
    parts.push(String.fromCharCode(...bytes.subarray(i, i + 0x8000)));
  return btoa(parts.join(''));
}

function fromBase64(text: string): Uint8Array {
  const binary = atob(text);
  const bytes = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
  return bytes;
}

export function isPacked(stored: string): boolean {
  return stored.startsWith(PACKED_MARK);
}

/** The form to store: the text itself when short, packed when long. */
export async function packForStorage(text: string): Promise<string> {
  if (text.length <= PACK_ABOVE) return text;
  const packed = await through(new TextEncoder().encode(text), new CompressionStream('gzip'));
  return PACKED_MARK + toBase64(packed);
}

/** The text a stored value holds; throws when a packed value is damaged. */
export async function unpackFromStorage(stored: string): Promise<string> {
  if (!isPacked(stored)) return stored;
  const bytes = await through(fromBase64(stored.slice(PACKED_MARK.length)), new DecompressionStream('gzip'));
  return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
}
