import {
  LOOKS,
  PROBLEM_GLYPHS,
  STATIC_CURRENT_COLOUR,
  type ProblemMark,
} from '../core/view/visualLanguage.ts';

const PROBLEMS: readonly [ProblemMark, string][] = [
  ['contention', 'fought over: drivers of both levels'],
  ['floating', 'floating: no path to any source'],
  ['degraded', 'degraded: arrived through a threshold drop'],
  ['charge-shared', 'charge shared with another floating net'],
  ['oscillating', 'no steady state'],
  ['stored-state', 'holds stored state: several steady states (a latch in a sweep), shown as X'],
];

/** What the marks on the sheet mean: every look has a dash pattern and a text mark, not colour alone. */
export function Legend() {
  return (
    <details className="rw-subsection" data-testid="legend">
      <summary>What the sheet shows</summary>
      <ul className="rw-legend">
        {Object.values(LOOKS).map((look) => (
          <li key={look.name}>
            <svg width="30" height="8" aria-hidden="true">
              <line
                x1="1"
                x2="29"
                y1="4"
                y2="4"
                stroke={look.colour}
                strokeWidth="3"
                strokeDasharray={look.dash.join(' ')}
              />
            </svg>
            <span className="rw-mono">{look.mark}</span> {look.description}
          </li>
        ))}
        <li>
          <svg width="30" height="8" aria-hidden="true">
            <line x1="1" x2="29" y1="4" y2="4" stroke={STATIC_CURRENT_COLOUR} strokeWidth="4" opacity="0.6" />
          </svg>
          ⇣ static current: glowing trace with flow arrows, supply to ground, amperes beside it
        </li>
        <li>● transistor on · ○ off · (?) maybe: its gate is unknown</li>
        {PROBLEMS.map(([mark, text]) => (
          <li key={mark}>
            {PROBLEM_GLYPHS[mark]} {text}
          </li>
        ))}
        <li>
          An output at X for a 0/1 vector is an <em>unknown</em> finding: an error unless its expected
          function allows it (naming the output there means it holds its value).
        </li>
        <li>Point at a wire to read its estimated voltage.</li>
        <li>Double-click an input pin, or click its bit above, to flip it; [ and ] step through vectors.</li>
      </ul>
    </details>
  );
}
