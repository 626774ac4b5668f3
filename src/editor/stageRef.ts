/** The mounted Konva stage, for PNG export only (rendering never reads it back into state). */
import type Konva from 'konva';

let current: Konva.Stage | null = null;

export function setStage(stage: Konva.Stage | null): void {
  current = stage;
}

export function currentStage(): Konva.Stage | null {
  return current;
}
