import type { WidthProposal } from '../../core/sizing/proposeWidths.ts';

/** Proposed widths for the drive of a reference inverter, old beside new, in µm. */
export function ProposalTable({ proposal }: { readonly proposal: WidthProposal }) {
  const rows = Object.entries(proposal.widths);
  return (
    <>
      <table className="rw-power-table" data-testid="width-proposal">
        <caption className="rw-muted">Proposed widths (µm) for the reference drive</caption>
        <thead>
          <tr>
            <th scope="col">device</th>
            <th scope="col">drawn</th>
            <th scope="col">proposed</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(([name, w]) => (
            <tr key={name}>
              <th scope="row" className="rw-mono">
                {name}
              </th>
              <td className="rw-num">{Number(w.from.toPrecision(3))}</td>
              <td className="rw-num">{Number(w.to.toPrecision(3))}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {proposal.notes.map((note) => (
        <p key={note} className="rw-muted">
          {note}
        </p>
      ))}
    </>
  );
}
