/**
 * The library view's state: open or closed, its sort and filter, and its job, which checks every
 * cell of the design in the library lane of the worker. While the view is open the job follows the
 * document: any committed change to any cell starts it again once edits pause (the lane drops the
 * answer of a job that was superseded).
 */
import type { LibraryTableView } from '../core/view/libraryTable.ts';
import { DEFAULT_LIBRARY_VIEW } from '../core/view/libraryTable.ts';
import type { Design } from '../core/document/design.ts';
import { acceptKinds, cancelLane, runInLane, type LaneHost } from '../worker/lanes.ts';
import type { LibraryResult } from '../worker/protocol.ts';
import { setSimulation } from './simulation.ts';
import { currentDesign, store } from './store.ts';

/** Edits pause this long before the library is checked again. */
const RECHECK_DELAY_MS = 200;

const host: LaneHost<LibraryResult> = {
  publish: (library) => setSimulation({ library }),
  read: () => store.getState().simulation.library,
  accept: acceptKinds(['library']),
};

/** The design as the worker needs it: no drawings. */
function withoutSheets(design: Design): Design {
  return { ...design, cells: design.cells.map(({ sheet: _sheet, ...cell }) => cell) };
}

export function startLibraryCheck(): Promise<void> {
  const { revision } = store.getState();
  return runInLane('library', { kind: 'library', revision, design: withoutSheets(currentDesign()) }, host);
}

export function cancelLibraryCheck(): void {
  cancelLane('library');
}

export function openLibraryView(): void {
  const view = store.getState().simulation.libraryView;
  if (view === null) setSimulation({ libraryView: DEFAULT_LIBRARY_VIEW });
  const { library } = store.getState().simulation;
  if (library.status !== 'running' && library.revision !== store.getState().revision)
    void startLibraryCheck();
}

export function closeLibraryView(): void {
  setSimulation({ libraryView: null });
}

export function setLibraryView(patch: Partial<LibraryTableView>): void {
  const view = store.getState().simulation.libraryView ?? DEFAULT_LIBRARY_VIEW;
  setSimulation({ libraryView: { ...view, ...patch } });
}

/** Sorts by a column; the same column again turns the order round. */
export function sortLibraryBy(sort: LibraryTableView['sort']): void {
  const view = store.getState().simulation.libraryView ?? DEFAULT_LIBRARY_VIEW;
  const direction = view.sort === sort && view.direction === 'ascending' ? 'descending' : 'ascending';
  setLibraryView({ sort, direction });
}

/** Keeps the library's results in step with the document while the view is open. */
export function followLibrary(): () => void {
  let timer: ReturnType<typeof setTimeout> | null = null;
  const unsubscribe = store.subscribe((s, previous) => {
    if (s.simulation.libraryView === null || s.revision === previous.revision) return;
    if (timer !== null) clearTimeout(timer);
    timer = setTimeout(() => {
      timer = null;
      if (store.getState().simulation.libraryView !== null) void startLibraryCheck();
    }, RECHECK_DELAY_MS);
  });
  return () => {
    unsubscribe();
    if (timer !== null) clearTimeout(timer);
  };
}
