import { memo } from 'react';
import { Shape } from 'react-konva';
import type { Context } from 'konva/lib/Context';
import type { Shape as KonvaShape } from 'konva/lib/Shape';
import type { PaintedDevice, PaintedMark } from '../../core/view/overlayPaint.ts';
import { LOOKS, type Conduction, type LookName } from '../../core/view/visualLanguage.ts';

/**
 * Painters draw a whole group (every wire of one look, every mark, every device mark) in one Konva
 * shape: a few shapes per sheet instead of thousands of nodes, so big sheets stay smooth.
 */

/** Level strokes sit over the scene's wires, a little wider so the ink shows as an outline. */
export const LEVEL_STROKE = 0.2;
const MARK_FONT = 0.55;
const SHEET_BACKGROUND = '#fbfaf7';

interface StrokePainterProps {
  readonly look: LookName;
  readonly lines: readonly (readonly number[])[];
  /** Pixels per grid unit: dash lengths stay constant on screen. */
  readonly scale: number;
}

export const StrokePainter = memo(function StrokePainter({ look, lines, scale }: StrokePainterProps) {
  const style = LOOKS[look];
  const draw = (ctx: Context, shape: KonvaShape): void => {
    ctx.beginPath();
    for (const l of lines) {
      ctx.moveTo(l[0] ?? 0, l[1] ?? 0);
      for (let i = 2; i + 1 < l.length; i += 2) ctx.lineTo(l[i] ?? 0, l[i + 1] ?? 0);
    }
    ctx.strokeShape(shape);
  };
  return (
    <Shape
      sceneFunc={draw}
      stroke={style.colour}
      strokeWidth={LEVEL_STROKE}
      dash={style.dash.map((d) => d / scale)}
      lineCap="butt"
      lineJoin="round"
      opacity={0.9}
      listening={false}
      perfectDrawEnabled={false}
    />
  );
});

/** Level marks and problem badges as text, haloed in the sheet colour so they read over ink. */
export const MarkPainter = memo(function MarkPainter({ marks }: { marks: readonly PaintedMark[] }) {
  const draw = (ctx: Context): void => {
    ctx.setAttr('font', `bold ${MARK_FONT}px sans-serif`);
    ctx.setAttr('textBaseline', 'top');
    ctx.setAttr('lineWidth', 0.12);
    ctx.setAttr('strokeStyle', SHEET_BACKGROUND);
    for (const m of marks) {
      ctx.strokeText(m.text, m.x, m.y);
      ctx.setAttr('fillStyle', LOOKS[m.look].colour);
      ctx.fillText(m.text, m.x, m.y);
    }
  };
  return <Shape sceneFunc={draw} listening={false} perfectDrawEnabled={false} />;
});

const RADIUS = 0.28;
const DEVICE_STYLE: Readonly<Record<Conduction, { fill: string; stroke: string; text: string }>> = {
  on: { fill: '#2f6b3a', stroke: '#2f6b3a', text: '' },
  off: { fill: SHEET_BACKGROUND, stroke: '#8d8d8d', text: '' },
  maybe: { fill: SHEET_BACKGROUND, stroke: '#b3243c', text: '?' },
};

/**
 * Transistor states as shapes: filled dot = conducting, hollow ring = off, ring with "?" = maybe
 * (its gate is unknown). Colour repeats the shape; it never carries the meaning alone.
 */
export const DevicePainter = memo(function DevicePainter({ devices }: { devices: readonly PaintedDevice[] }) {
  const draw = (ctx: Context): void => {
    ctx.setAttr('lineWidth', 0.08);
    ctx.setAttr('font', `bold 0.42px sans-serif`);
    ctx.setAttr('textAlign', 'center');
    ctx.setAttr('textBaseline', 'middle');
    for (const d of devices) {
      const style = DEVICE_STYLE[d.conduction];
      ctx.beginPath();
      ctx.arc(d.x, d.y, RADIUS, 0, 2 * Math.PI, false);
      ctx.setAttr('fillStyle', style.fill);
      ctx.setAttr('strokeStyle', style.stroke);
      ctx.fill();
      ctx.stroke();
      if (style.text !== '') {
        ctx.setAttr('fillStyle', style.stroke);
        ctx.fillText(style.text, d.x, d.y + 0.02);
      }
    }
  };
  return <Shape sceneFunc={draw} listening={false} perfectDrawEnabled={false} />;
});
