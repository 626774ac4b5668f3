/**
 * Neutral drawing of the sheet. Levels are drawn by the simulation overlay in its own colours;
 * the scene stays in ink tones so that those colours carry meaning.
 */
export const SHEET_THEME = {
  background: '#fbfaf7',
  gridDot: '#d4d1c8',
  ink: '#2b2d33',
  wire: '#3a4150',
  selected: '#0f8a7e',
  highlight: '#7a3fb8',
  /** Marks where an edit was refused because it would have joined or cut nets. */
  refused: '#c2410c',
  pinDot: '#8a8f99',
  boxFill: 'rgba(15, 138, 126, 0.08)',
  boxStroke: '#0f8a7e',
  ghost: '#9aa3ad',
  text: '#2b2d33',
  subtleText: '#6b7280',
} as const;

/**
 * Stroke widths in grid units (the stage is scaled so one unit is `scale` px). Text sizes belong to
 * the part specs (`TEXT_SIZE` in `core/sheet/parts/text.ts`), shared with the SVG export.
 */
export const STROKE = 0.09;
export const WIRE_STROKE = 0.1;
export const JUNCTION_RADIUS = 0.2;
