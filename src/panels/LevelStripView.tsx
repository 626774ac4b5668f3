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

/** One step's column: a click target that shows the step on the sheet, numbered underneath. */
function StepColumn({
  step,
  height,
  selected,
  onPick,
}: {
  step: number;
  height: number;
  selected: boolean;
  onPick: () => void;
}) {
  const x = LABEL_WIDTH + step * STEP_WIDTH;
  return (
    <g onClick={onPick} style={{ cursor: 'pointer' }}>
      <rect x={x} y={0} width={STEP_WIDTH} height={height} fill={selected ? '#00000014' : 'transparent'} />
      <text x={x + STEP_WIDTH / 2} y={height - 3} fontSize={9} textAnchor="middle" fill="#666">
        {step + 1}
      </text>
    </g>
  );
}

/** One net's runs: high sits up, low sits down, Z and X in the middle, each with its dash and mark. */
function StripRow({ strip, row }: { strip: LevelStrip; row: number }) {
  return (
    <g
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
  );
}

/** Levels over steps as bars, one row per chosen net; a click on a step shows it on the sheet. */
export function LevelStripView({ strips, steps, selectedStep, onPickStep }: LevelStripViewProps) {
  const height = strips.length * ROW_HEIGHT + 14;
  return (
    <svg
      className="rw-strip"
      data-testid="level-strips"
      width={LABEL_WIDTH + steps * STEP_WIDTH}
      height={height}
      role="img"
      aria-label="levels over steps"
    >
      {Array.from({ length: steps }, (_, s) => (
        <StepColumn
          key={s}
          step={s}
          height={height}
          selected={s === selectedStep}
          onPick={() => onPickStep(s)}
        />
      ))}
      {strips.map((strip, row) => (
        <StripRow key={strip.net} strip={strip} row={row} />
      ))}
    </svg>
  );
}
