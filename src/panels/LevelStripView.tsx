import { LOOKS } from '../core/view/visualLanguage.ts';
import type { LevelStrip } from '../core/view/levelStrip.ts';

interface LevelStripViewProps {
  readonly strips: readonly LevelStrip[];
  readonly steps: number;
  readonly selectedStep: number | null;
  readonly onPickStep: (step: number) => void;
}

const STEP_WIDTH = 28;
const ROW_HEIGHT = 22;
const LABEL_WIDTH = 56;

/**
 * Levels over steps as bars: high sits up, low sits down, Z and X fill the middle, each drawn with
 * its look's dash and mark so the strip reads without colour.
 */
export function LevelStripView({ strips, steps, selectedStep, onPickStep }: LevelStripViewProps) {
  const width = LABEL_WIDTH + steps * STEP_WIDTH;
  return (
    <svg
      className="rw-strip"
      data-testid="level-strips"
      width={width}
      height={strips.length * ROW_HEIGHT + 14}
      role="img"
      aria-label="levels over steps"
    >
      {Array.from({ length: steps }, (_, s) => (
        <g key={s} onClick={() => onPickStep(s)} style={{ cursor: 'pointer' }}>
          <rect
            x={LABEL_WIDTH + s * STEP_WIDTH}
            y={0}
            width={STEP_WIDTH}
            height={strips.length * ROW_HEIGHT + 14}
            fill={s === selectedStep ? '#00000014' : 'transparent'}
          />
          <text
            x={LABEL_WIDTH + s * STEP_WIDTH + STEP_WIDTH / 2}
            y={strips.length * ROW_HEIGHT + 11}
            fontSize={9}
            textAnchor="middle"
            fill="#666"
          >
            {s + 1}
          </text>
        </g>
      ))}
      {strips.map((strip, row) => (
        <g
          key={strip.net}
          transform={`translate(0 ${row * ROW_HEIGHT})`}
          data-testid={`strip-${strip.net}`}
          data-levels={strip.runs.flatMap((r) => Array<string>(r.end - r.start).fill(r.level)).join(' ')}
        >
          <text x={4} y={14} fontSize={11} fontFamily="monospace">
            {strip.net}
          </text>
          {strip.runs.map((run) => {
            const look = LOOKS[run.look];
            const y = run.level === '1' ? 4 : run.level === '0' ? 16 : 10;
            const x1 = LABEL_WIDTH + run.start * STEP_WIDTH + 1;
            const x2 = LABEL_WIDTH + run.end * STEP_WIDTH - 1;
            return (
              <g key={run.start} data-level={run.level}>
                <line
                  x1={x1}
                  x2={x2}
                  y1={y}
                  y2={y}
                  stroke={look.colour}
                  strokeWidth={3}
                  strokeDasharray={look.dash.join(' ')}
                />
                <text x={x1 + 2} y={run.level === '1' ? 15 : 11} fontSize={9} fill="#333">
                  {look.mark}
                </text>
              </g>
            );
          })}
        </g>
      ))}
    </svg>
  );
}
