import { lazy, Suspense, useEffect, useMemo } from 'react';
import { CAUTION } from '../core/caution.ts';
import { SheetCanvas } from '../editor/SheetCanvas.tsx';
import { createEditorController } from '../editor/tools/controller.ts';
import { fitToView } from '../state/view.ts';
import { AnalysisPanel } from '../panels/AnalysisPanel.tsx';
import { useStore } from '../state/store.ts';
import { Toolbar } from './Toolbar.tsx';
import { PartsShelf } from './PartsShelf.tsx';
import { StarterShelf } from './StarterShelf.tsx';
import { PropertiesForm } from './PropertiesForm.tsx';
import { MessageBar } from './MessageBar.tsx';
import { RecoveryOffer } from './RecoveryOffer.tsx';
import { handleKey } from './keyboard.ts';
import { LibraryView } from './LibraryView.tsx';
import { InstanceList, SheetPath } from './Hierarchy.tsx';
import { commandById } from './commands.ts';
import { OPEN_FILE_ACCEPT } from '../core/netlist-io/fileKinds.ts';
import { OPEN_INPUT_ID, openFileLater } from './fileCommands.ts';
import './app.css';

// Dialogs shown on request load when first asked for, so start-up parses less.
const HelpOverlay = lazy(() => import('./HelpOverlay.tsx').then((m) => ({ default: m.HelpOverlay })));
const AboutBox = lazy(() => import('./AboutBox.tsx').then((m) => ({ default: m.AboutBox })));

function OpenFileInput() {
  return (
    <input
      id={OPEN_INPUT_ID}
      data-testid="open-file"
      type="file"
      accept={OPEN_FILE_ACCEPT}
      hidden
      onChange={(e) => {
        const file = e.target.files?.[0];
        e.target.value = '';
        if (file) void openFileLater(file);
      }}
    />
  );
}

/** The shell: toolbar on top, shelves and the form on the left, the sheet, the analysis on the right. */
export function App() {
  const controller = useMemo(() => createEditorController(), []);
  const overlay = useStore((s) => s.overlay);
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => handleKey(e, controller);
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [controller]);
  return (
    <div className="rw-app">
      <Toolbar />
      <nav className="rw-left" aria-label="Shelves">
        <PartsShelf />
        <PropertiesForm />
        <InstanceList />
        <StarterShelf />
      </nav>
      <main className="rw-centre">
        <SheetPath />
        <SheetCanvas
          controller={controller}
          onFirstLayout={fitToView}
          onPartDoubleClick={commandById('rename').run}
        />
        <MessageBar />
        <footer className="rw-caution-line">{CAUTION}</footer>
      </main>
      <div className="rw-right-panel">
        <AnalysisPanel />
      </div>
      <OpenFileInput />
      <Suspense fallback={null}>
        {overlay === 'help' ? <HelpOverlay /> : null}
        {overlay === 'about' ? <AboutBox /> : null}
      </Suspense>
      <LibraryView />
      <RecoveryOffer />
    </div>
  );
}
