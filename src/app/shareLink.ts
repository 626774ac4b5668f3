/**
 * Share links: the whole design file carried in the address's fragment (`#design=…`), gzip-compressed
 * and base64url-encoded. The fragment never reaches a server; the design travels only when someone
 * sends the link. Opening a link is validated like opening a file: a damaged or foreign link gives a
 * message and leaves the open design as it was.
 */
import type { Design } from '../core/model/design.ts';
import { parseDesignFile, serializeDesign } from '../core/format/designFile.ts';
import { fitToView } from '../state/view.ts';
import { currentDesign, loadDesign, showMessage } from '../state/store.ts';

export const LINK_PREFIX = '#design=';
/** Name used in messages about a link, in place of a file name. */
export const LINK_SOURCE = 'shared link';

export class ShareLinkError extends Error {
  override readonly name = 'ShareLinkError';
}

async function pipe(bytes: Uint8Array, stream: CompressionStream | DecompressionStream): Promise<Uint8Array> {
  const out = new Blob([bytes as BlobPart]).stream().pipeThrough(stream);
  return new Uint8Array(await new Response(out).arrayBuffer());
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
  const packed = await pipe(new TextEncoder().encode(designText), new CompressionStream('gzip'));
  return LINK_PREFIX + toBase64Url(packed);
}

/** The design file text a fragment carries; throws ShareLinkError when it is damaged. */
export async function decodeDesignFragment(fragment: string): Promise<string> {
  if (!fragment.startsWith(LINK_PREFIX)) throw new ShareLinkError(`${LINK_SOURCE}: not a design link`);
  try {
    const bytes = await pipe(
      fromBase64Url(fragment.slice(LINK_PREFIX.length)),
      new DecompressionStream('gzip'),
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
    loadDesign(design);
    fitToView();
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
  const fragment = await encodeDesignFragment(serializeDesign(currentDesign()));
  const link = `${location.origin}${location.pathname}${fragment}`;
  try {
    await navigator.clipboard.writeText(link);
    showMessage('info', `A link to this design (${link.length} characters) is on the clipboard.`);
  } catch {
    history.replaceState(null, '', link);
    showMessage(
      'info',
      `A link to this design (${link.length} characters) is in the address bar: copy it from there.`,
    );
  }
}
