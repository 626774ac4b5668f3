import { Dialog } from './Dialog.tsx';
import { loadDesign, showMessage } from '../state/store.ts';
import { fitToView } from '../state/view.ts';
import {
  beginOpening,
  openingDone,
  RESCUE_KEY,
  settleSuspect,
  suspectDesign,
  useRecovery,
  whenShown,
} from './autosave.ts';

/**
 * Offered at start-up when the last start never finished opening the autosaved design (the tab froze
 * or crashed): the page opened on the starter instead, and the designer chooses.
 */
export function RecoveryOffer() {
  const suspect = useRecovery();
  if (suspect === null) return null;
  const discard = (): void => {
    settleSuspect('discarded');
    showMessage(
      'info',
      `The design was set aside; its text is kept under "${RESCUE_KEY}" in this browser's storage.`,
    );
  };
  const open = async (): Promise<void> => {
    const design = await suspectDesign();
    settleSuspect(design === null ? 'discarded' : 'opened');
    if (design === null) return showMessage('error', 'The set-aside design could not be read.');
    const opening = beginOpening('autosave', design.name);
    loadDesign(design);
    fitToView();
    whenShown(() => openingDone(opening));
  };
  return (
    <Dialog title="Your design did not open last time" onClose={discard}>
      <p>
        The page stopped while opening your autosaved design “{suspect.name}”, so it opened a starter cell
        instead. The design may be too large or damaged.
      </p>
      <div className="rw-dialog-actions">
        <button type="button" onClick={() => void open()}>
          Open it anyway
        </button>
        <button type="button" onClick={discard}>
          Discard it
        </button>
      </div>
    </Dialog>
  );
}
