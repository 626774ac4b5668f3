import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app/App.tsx';
import { ErrorBoundary } from './app/ErrorBoundary.tsx';
import { openFirstDesign } from './app/startup.ts';
import { openSharedLink } from './app/shareLink.ts';
import { startAutosave } from './app/autosave.ts';
import { restoreSessionHistory, startSessionHistory } from './app/sessionHistory.ts';
import { installTestApi } from './app/testApi.ts';
import { startAnalysis, warmAnalysis } from './state/analysis.ts';

/** Opens the design (the autosaved one, expanded first when it was stored packed), then the page. */
async function start(root: HTMLElement): Promise<void> {
  warmAnalysis();
  await openFirstDesign();
  restoreSessionHistory();
  startAnalysis({ startNow: true });
  void openSharedLink();
  startAutosave();
  startSessionHistory();
  installTestApi();
  createRoot(root).render(
    <StrictMode>
      <ErrorBoundary>
        <App />
      </ErrorBoundary>
    </StrictMode>,
  );
}

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');
void start(root);
