import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState, type RefObject } from 'react';
import { Layer, Stage } from 'react-konva';
import type Konva from 'konva';
import type { KonvaEventObject } from 'konva/lib/Node';
import { setScreen, setViewport, store, useStore } from '../state/store.ts';
import { screenToSheet, zoomAt } from '../state/viewport.ts';
import { zoomFloor } from '../state/view.ts';
import { SimulationOverlay } from './overlay/SimulationOverlay.tsx';
import { PointerTip } from './overlay/PointerTip.tsx';
import { GridLayer } from './GridLayer.tsx';
import { EmphasisLayer, SceneLayer } from './SceneLayer.tsx';
import { InteractionLayer } from './InteractionLayer.tsx';
import { createEditorController, type EditorController } from './tools/controller.ts';
import type { ToolPointer } from './tools/types.ts';
import { setStage } from './stageRef.ts';
import { hitTest } from '../core/sheet/hitTest.ts';
import { indexFor } from './tools/sheetIndex.ts';
import { SHEET_THEME } from './theme.ts';

/**
 * Keeps the store told of the sheet area's size (for fit-to-view and the grid); true once it has
 * been measured. Measured before the first paint, so the stage is made at its size and in its first
 * view: a Konva stage draws every layer as it is made and again as it is resized.
 */
function useElementSize(ref: RefObject<HTMLDivElement | null>, onFirstLayout?: () => void): boolean {
  const [measured, setMeasured] = useState(false);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    let first = true;
    const update = () => {
      setScreen(Math.floor(el.clientWidth), Math.floor(el.clientHeight));
      if (first && el.clientWidth > 0) {
        first = false;
        onFirstLayout?.();
      }
    };
    update();
    setMeasured(true);
    const observer = new ResizeObserver(update);
    observer.observe(el);
    return () => observer.disconnect();
  }, [ref, onFirstLayout]);
  return measured;
}

function toPointer(stage: Konva.Stage, evt: MouseEvent): ToolPointer | null {
  const screen = stage.getPointerPosition();
  if (!screen) return null;
  return {
    at: screenToSheet(store.getState().viewport, screen),
    screen,
    shift: evt.shiftKey,
    button: evt.button,
  };
}

/** The sheet: a Konva stage scaled so one grid unit is `viewport.scale` pixels. */
export function SheetCanvas({
  controller,
  onFirstLayout,
  onPartDoubleClick,
}: {
  controller?: EditorController;
  onFirstLayout?: () => void;
  /** A double click that leaves exactly one part selected (the shell opens its name for editing). */
  onPartDoubleClick?: () => void;
}) {
  const box = useRef<HTMLDivElement>(null);
  const stageRef = useRef<Konva.Stage>(null);
  const ctl = useMemo(() => controller ?? createEditorController(), [controller]);
  const viewport = useStore((s) => s.viewport);
  const screen = useStore((s) => s.screen);
  const tool = useStore((s) => s.tool);
  // The same elements every render: a pan or zoom re-renders the stage's transform, never the
  // drawing (each part reads the store itself and draws the view when Konva asks). Everything is in
  // one Konva layer, so a frame composites one canvas; the pointer's tip is a page element over it.
  const layers = useMemo(
    () => (
      <Layer listening={false}>
        <GridLayer />
        <SceneLayer />
        <EmphasisLayer />
        <SimulationOverlay />
        <InteractionLayer />
      </Layer>
    ),
    [],
  );
  const measured = useElementSize(box, onFirstLayout);
  useEffect(() => {
    if (!measured) return;
    setStage(stageRef.current);
    return () => setStage(null);
  }, [measured]);
  // Handlers made once, so a re-render of the stage never rebinds its events.
  const handlers = useMemo(() => {
    const route = (fn: (e: ToolPointer) => void) => (e: KonvaEventObject<MouseEvent>) => {
      const stage = e.target.getStage();
      const p = stage && toPointer(stage, e.evt);
      if (p) fn(p);
    };
    return { down: route(ctl.down), move: route(ctl.move), up: route(ctl.up) };
  }, [ctl]);
  const onWheel = useCallback((e: KonvaEventObject<WheelEvent>) => {
    e.evt.preventDefault();
    const p = e.target.getStage()?.getPointerPosition();
    if (!p) return;
    // Trackpads send many small deltas; scale the factor by the delta so both feel alike.
    const factor = Math.exp(-e.evt.deltaY * 0.0015);
    setViewport(zoomAt(store.getState().viewport, p, factor, zoomFloor()));
  }, []);
  return (
    <div
      ref={box}
      className="sheet-canvas"
      data-testid="sheet"
      data-tool={tool.mode}
      style={{ background: SHEET_THEME.background, cursor: tool.mode === 'select' ? 'default' : 'crosshair' }}
      // Focusable, and focused on press, so keys act on the sheet rather than the last button.
      tabIndex={0}
      aria-label="Sheet"
      onMouseDown={(e) => e.currentTarget.focus({ preventScroll: true })}
      onContextMenu={(e) => e.preventDefault()}
      // The browser's double click (same spot, not just two quick clicks anywhere) on a selected part.
      onDoubleClick={(e) => {
        const rect = e.currentTarget.getBoundingClientRect();
        const s = store.getState();
        const at = screenToSheet(s.viewport, { x: e.clientX - rect.left, y: e.clientY - rect.top });
        const hit = hitTest(indexFor(s.doc.sheet), at);
        if (
          s.tool.mode === 'select' &&
          hit?.type === 'part' &&
          s.selection.selected.parts.includes(hit.partId)
        ) {
          onPartDoubleClick?.();
        }
      }}
    >
      {measured && (
        <Stage
          ref={stageRef}
          width={screen.width}
          height={screen.height}
          x={viewport.x}
          y={viewport.y}
          scaleX={viewport.scale}
          scaleY={viewport.scale}
          onMouseDown={handlers.down}
          onMouseMove={handlers.move}
          onMouseUp={handlers.up}
          onWheel={onWheel}
        >
          {layers}
        </Stage>
      )}
      <PointerTip box={box} />
    </div>
  );
}
