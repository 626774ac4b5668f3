import { useEffect, useState, type RefObject } from 'react';
import { hitTest, type Hit } from '../../core/sheet/hitTest.ts';
import type { Point, Sheet } from '../../core/sheet/types.ts';
import { formatVolts } from '../../core/view/format.ts';
import { lookOf } from '../../core/view/visualLanguage.ts';
import { toggleInput, useSimulation } from '../../state/simulation.ts';
import type { SheetGeometry } from '../../state/document.ts';
import { store, useStore } from '../../state/store.ts';
import { descendInto } from '../../state/navigation.ts';
import { fitToView } from '../../state/view.ts';
import { screenToSheet, sheetToScreen } from '../../state/viewport.ts';
import { indexFor } from '../tools/sheetIndex.ts';
import { SHEET_THEME } from '../theme.ts';

type Hover = { readonly net: string; readonly at: Point } | null;

function netOfHit(hit: Hit | null, geometry: SheetGeometry): string | undefined {
  if (hit === null) return undefined;
  if (hit.type === 'wire') return geometry.wireNets[hit.wireId];
  if (hit.type === 'pin') return geometry.pinNets.get(`${hit.partId}.${hit.pin}`);
  return geometry.pinNets.get(`${hit.partId}.net`);
}

/** The input pin under the pointer, if any: double-clicking it flips that input. */
function inputOfHit(hit: Hit | null, sheet: Sheet, geometry: SheetGeometry): string | undefined {
  if (hit === null || hit.type === 'wire') return undefined;
  const part = sheet.parts.find((p) => p.id === hit.partId);
  return part?.kind === 'input' ? geometry.pinNets.get(`${part.id}.net`) : undefined;
}

/** The instance whose symbol is under the pointer, if any: double-clicking it descends into it. */
function instanceOfHit(hit: Hit | null, sheet: Sheet): string | undefined {
  if (hit === null || hit.type === 'wire') return undefined;
  const part = sheet.parts.find((p) => p.id === hit.partId);
  return part?.kind === 'instance' ? part.name : undefined;
}

/** The sheet point under a mouse event on the sheet's box. */
function sheetPointOf(box: HTMLElement, e: MouseEvent): Point {
  const rect = box.getBoundingClientRect();
  return screenToSheet(store.getState().viewport, { x: e.clientX - rect.left, y: e.clientY - rect.top });
}

/** Where the tip stands from the point it describes, in grid units (right of it, a little above). */
const TIP_OFFSET = { x: 0.5, y: -1.3 };

/**
 * Pointer on the sheet, found by pure hit testing: the estimated voltage of the wire or pin under
 * it, in a page element over the sheet (no canvas of its own to allocate or composite each frame);
 * a double-click on an input pin flips that input (the same action as its bit in the panel), on an
 * instance's symbol descends into it (as its line in the Instances list does).
 */
export function PointerTip({ box }: { readonly box: RefObject<HTMLDivElement | null> }) {
  const sheet = useStore((s) => s.doc.sheet);
  const geometry = useStore((s) => s.geometry);
  const viewport = useStore((s) => s.viewport);
  const [hover, setHover] = useState<Hover>(null);
  const state = useSimulation((s) => (hover === null ? undefined : s.live?.net(hover.net)));
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    // The editor's cached index of this very sheet, built when the pointer first needs it.
    const hitAt = (at: Point): Hit | null => hitTest(indexFor(sheet), at);
    const onMove = (e: MouseEvent): void => {
      const at = sheetPointOf(el, e);
      const net = netOfHit(hitAt(at), geometry);
      setHover(net !== undefined ? { net, at } : null);
    };
    const onDoubleClick = (e: MouseEvent): void => {
      const hit = hitAt(sheetPointOf(el, e));
      const input = inputOfHit(hit, sheet, geometry);
      if (input !== undefined) return toggleInput(input);
      const instance = instanceOfHit(hit, sheet);
      if (instance !== undefined && descendInto(instance)) fitToView();
    };
    const onLeave = (): void => setHover(null);
    el.addEventListener('mousemove', onMove);
    el.addEventListener('dblclick', onDoubleClick);
    el.addEventListener('mouseleave', onLeave);
    return () => {
      el.removeEventListener('mousemove', onMove);
      el.removeEventListener('dblclick', onDoubleClick);
      el.removeEventListener('mouseleave', onLeave);
    };
  }, [box, sheet, geometry]);
  if (hover === null || state === undefined) return null;
  const at = sheetToScreen(viewport, { x: hover.at.x + TIP_OFFSET.x, y: hover.at.y + TIP_OFFSET.y });
  return (
    <div
      className="rw-pointer-tip"
      data-testid="pointer-tip"
      style={{ left: at.x, top: at.y, color: SHEET_THEME.ink, borderColor: SHEET_THEME.ink }}
    >
      {`${hover.net}  ${formatVolts(state.volts)}  ${lookOf(state).description}`}
    </div>
  );
}
