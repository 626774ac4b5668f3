import { CAUTION } from '../core/caution.ts';
import { setOverlay, useStore } from '../state/store.ts';
import { Dialog } from './Dialog.tsx';

/** What Railwise is, where its default numbers come from, and the caution that goes with them. */
export function AboutBox() {
  const source = useStore((s) => s.doc.technology.source);
  return (
    <Dialog title="About Railwise" onClose={() => setOverlay(null)}>
      <div className="rw-about">
        <p>
          Railwise is a transistor-level switch simulator for people who design CMOS cells. It resolves every
          net of the drawn network for each input vector by resistance strength: levels, floating and
          fought-over nets, threshold drops, static current paths, power and sizing.
        </p>
        <p className="rw-caution" role="note">
          <strong>Caution:</strong> {CAUTION}
        </p>
        <p>
          Default process values: {source}. Change them per design; they are recalled textbook figures, not a
          foundry's.
        </p>
      </div>
    </Dialog>
  );
}
