/**
 * Share links: the whole design file carried in the address's fragment (`#design=…`), gzip-compressed
 * and base64url-encoded. The fragment never reaches a server; the design travels only when someone
 * sends the link. Opening a link is validated like opening a file: a damaged or foreign link gives a
 * message and leaves the open design as it was.
 */
import type { Design } from '../core/document/design.ts';
import { countOf } from '../core/view/plural.ts';
import { parseDesignFile, serializeDesign } from '../core/format/designFile.ts';
import { fitToView } from '../state/view.ts';
import { currentDesign, loadDesign, showMessage } from '../state/store.ts';
import { beginOpening, openingDone, whenShown } from './autosave.ts';

export const LINK_PREFIX = '#design=';
/** Name used in messages about a link, in place of a file name. */
export const LINK_SOURCE = 'shared link';

/**
 * Longest link read, in characters after `#design=` (browsers carry addresses of about 2 MB), and
 * the most design text it may unpack to. Unpacking stops the moment the text passes the bound, so
 * a small link that would inflate to gigabytes costs no more than this.
 */
export const MAX_LINK_CHARS = 2_000_000;
export const MAX_LINK_DESIGN_BYTES = 4 * 1024 * 1024;

export class ShareLinkError extends Error {
  override readonly name = 'ShareLinkError';
}

async function compress(bytes: Uint8Array): Promise<Uint8Array> {
  const out = new Blob([bytes as BlobPart]).stream().pipeThrough(new CompressionStream('gzip'));
  return new Uint8Array(await new Response(out).arrayBuffer());
}

/** Unpacks gzip piece by piece, giving up as soon as the output passes `limit` bytes. */
async function inflateBounded(bytes: Uint8Array, limit: number): Promise<Uint8Array> {
  const reader = new Blob([bytes as BlobPart])
    .stream()
    .pipeThrough(new DecompressionStream('gzip'))
    .getReader();
  const pieces: Uint8Array[] = [];
  let total = 0;
  for (let next = await reader.read(); !next.done; next = await reader.read()) {
    total += next.value.length;
    if (total > limit) {
      await reader.cancel();
      throw new ShareLinkError(
        `${LINK_SOURCE}: the design in the link unpacks to more than ${limit / (1024 * 1024)} MB; share it as a file instead`,
      );
    }
    pieces.push(next.value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const piece of pieces) {
    out.set(piece, at);
    at += piece.length;
  }
  return out;
}

function toBase64Url(bytes: Uint8Array): string {
  let binary = '';
  for (const b of bytes) binary += String.fromCharCode(b);
  return btoa(binary).replaceAll('+', '-').replaceAll('/', '_').replace(/=+$/, '');
}

function fromBase64Url(text: string): Uint8Array {
  if (!/^[A-Za-z0-9_-]*$/.test(text))
    throw new ShareLinkError(`${LINK_SOURCE}: the link holds characters a design link never has`);
  const binary = atob(text.replaceAll('-', '+').replaceAll('_', '/'));
  return Uint8Array.from(binary, (c) => c.charCodeAt(0));
}

/** The fragment (`#design=…`) that carries a design file's text. */
export async function encodeDesignFragment(designText: string): Promise<string> {
  const text = new TextEncoder().encode(designText);
  if (text.length > MAX_LINK_DESIGN_BYTES) throw new ShareLinkError(tooBigToShare(`${text.length} bytes`));
  const fragment = LINK_PREFIX + toBase64Url(await compress(text));
  if (fragment.length - LINK_PREFIX.length > MAX_LINK_CHARS)
    throw new ShareLinkError(tooBigToShare(`a link of ${fragment.length} characters`));
  return fragment;
}

function tooBigToShare(size: string): string {
  return `this design is too large for a link (${size}); save it as a file and send that instead`;
}

/** The design file text a fragment carries; throws ShareLinkError when it is damaged. */
export async function decodeDesignFragment(fragment: string): Promise<string> {
  if (!fragment.startsWith(LINK_PREFIX)) throw new ShareLinkError(`${LINK_SOURCE}: not a design link`);
  if (fragment.length - LINK_PREFIX.length > MAX_LINK_CHARS)
    throw new ShareLinkError(`${LINK_SOURCE}: the link is longer than ${MAX_LINK_CHARS} characters`);
  try {
    const bytes = await inflateBounded(
      fromBase64Url(fragment.slice(LINK_PREFIX.length)),
      MAX_LINK_DESIGN_BYTES,
    );
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch (e) {
    if (e instanceof ShareLinkError) throw e;
    throw new ShareLinkError(
      `${LINK_SOURCE}: the link is damaged or cut short (${e instanceof Error ? e.message : String(e)})`,
    );
  }
}

/** Reads the design a fragment carries, validated like a design file. */
export async function designFromFragment(fragment: string): Promise<Design> {
  return parseDesignFile(await decodeDesignFragment(fragment), LINK_SOURCE);
}

/**
 * On start-up: opens the design in the address, if there is one, as an undoable change over what
 * autosave restored; then clears the fragment so a reload keeps the designer's own edits.
 */
export async function openSharedLink(): Promise<void> {
  if (!location.hash.startsWith(LINK_PREFIX)) return;
  const fragment = location.hash;
  history.replaceState(null, '', location.pathname + location.search);
  try {
    const design = await designFromFragment(fragment);
    // Not saved until the page has shown it: a link that freezes the page never replaces your design.
    const opening = beginOpening('link', design.name);
    loadDesign(design);
    fitToView();
    whenShown(() => openingDone(opening));
    showMessage('info', `Opened "${design.name}" from a shared link. Undo returns to your previous design.`);
  } catch (e) {
    showMessage('error', `${e instanceof Error ? e.message : String(e)}. Your design is unchanged.`);
  }
}

/**
 * Puts a link to the open design on the clipboard; where the browser refuses, in the address bar
 * instead (a reload there reopens the shared version, with undo back to the autosaved one).
 */
export async function shareCurrentDesign(): Promise<void> {
  let fragment: string;
  try {
    fragment = await encodeDesignFragment(serializeDesign(currentDesign()));
  } catch (e) {
    if (!(e instanceof ShareLinkError)) throw e;
    return showMessage('error', `No link made: ${e.message}.`);
  }
  const link = `${location.origin}${location.pathname}${fragment}`;
  try {
    await navigator.clipboard.writeText(link);
    showMessage('info', `A link to this design (${countOf(link.length, 'character')}) is on the clipboard.`);
  } catch {
    history.replaceState(null, '', link);
    showMessage(
      'info',
      `A link to this design (${countOf(link.length, 'character')}) is in the address bar: copy it from there.`,
    );
  }
}
