/**
 * Railwise's visual language for levels on the sheet and in the strips (docs/semantics.md §9). Never colour alone:
 * each look also has a dash pattern and a text mark, so it reads in greyscale and for colour-blind users.
 */
import type { Level } from '../analysis/report.ts';

/** What the solver says about one net for the selected vector. */
export interface NetState {
  readonly level: Level;
  /** Estimated volts; null when unknown. */
  readonly volts: number | null;
  readonly degraded: boolean;
  readonly contention: boolean;
  readonly chargeShared: boolean;
  readonly oscillating: boolean;
  /** Several steady states disagree on it: it holds stored state (a latch in a sweep), shown as X. */
  readonly stored: boolean;
  /** The level holds only under some on/off choice of maybe-conducting devices. */
  readonly maybe: boolean;
}

export type LookName = 'high' | 'low' | 'floating' | 'unknown' | 'degraded-high' | 'degraded-low';

export interface Look {
  readonly name: LookName;
  readonly colour: string;
  /** Konva/SVG dash array in pixels; empty for solid. */
  readonly dash: readonly number[];
  /** Short text drawn beside the wire and in strips. */
  readonly mark: string;
  readonly description: string;
}

export const LOOKS: Readonly<Record<LookName, Look>> = {
  high: { name: 'high', colour: '#e0a526', dash: [], mark: '1', description: 'high (1), solid amber' },
  low: { name: 'low', colour: '#5a6f96', dash: [], mark: '0', description: 'low (0), solid slate blue' },
  floating: {
    name: 'floating',
    colour: '#8d8d8d',
    dash: [6, 5],
    mark: 'Z',
    description: 'floating (Z), grey dashed',
  },
  unknown: {
    name: 'unknown',
    colour: '#b3243c',
    dash: [10, 4, 2, 4],
    mark: 'X',
    description: 'undefined (X), crimson dash-dot',
  },
  'degraded-high': {
    name: 'degraded-high',
    colour: '#e0a526',
    dash: [3, 4],
    mark: '1↓',
    description: 'degraded high, amber dashed',
  },
  'degraded-low': {
    name: 'degraded-low',
    colour: '#5a6f96',
    dash: [3, 4],
    mark: '0↑',
    description: 'degraded low, slate dashed',
  },
};

export function lookOf(state: Pick<NetState, 'level' | 'degraded'>): Look {
  switch (state.level) {
    case '1':
      return state.degraded ? LOOKS['degraded-high'] : LOOKS.high;
    case '0':
      return state.degraded ? LOOKS['degraded-low'] : LOOKS.low;
    case 'Z':
      return LOOKS.floating;
    case 'X':
      return LOOKS.unknown;
  }
}

/** Static current: an ember trace, distinct from every level colour, always with arrows and its value. */
export const STATIC_CURRENT_COLOUR = '#ff5a1f';

export type ProblemMark =
  'floating' | 'contention' | 'degraded' | 'charge-shared' | 'oscillating' | 'stored-state';

/** Problem badges for a net, most serious first; an empty list for a clean level. */
export function problemMarks(state: NetState): ProblemMark[] {
  const marks: ProblemMark[] = [];
  if (state.oscillating) marks.push('oscillating');
  else if (state.stored) marks.push('stored-state');
  if (state.contention) marks.push('contention');
  if (state.level === 'Z') marks.push('floating');
  if (state.degraded) marks.push('degraded');
  if (state.chargeShared) marks.push('charge-shared');
  return marks;
}

/** Badge glyphs: distinct shapes, readable without colour. */
export const PROBLEM_GLYPHS: Readonly<Record<ProblemMark, string>> = {
  oscillating: '∿',
  'stored-state': '‖',
  contention: '⚔',
  floating: '◌',
  degraded: '▽',
  'charge-shared': '⇋',
};

export type Conduction = 'on' | 'off' | 'maybe';
