/**
 * The task pane's entry: `startPane(document)` is called by src/addin.ts once Office is ready. It
 * wires the pane to Excel.run and to the workbook's document settings; tests and other hosts call
 * {@link createPane} with their own.
 */
import { type PaneHost, createPane } from './pane';
import type { SettingsStore } from './persist';
import type { RunBatch } from './resultSheets';
import { followTheme } from './theme';

export { createPane } from './pane';

/** Excel.run, or a clear failure when the pane is opened outside Excel. */
const excelRun: RunBatch = (batch) => {
  if (typeof Excel === 'undefined' || typeof Excel.run !== 'function') {
    return Promise.reject(new Error('Excel is not available here: open the pane from the Sunpane button in Excel.'));
  }
  return Excel.run(batch);
};

function documentSettings(): SettingsStore | undefined {
  if (typeof Office === 'undefined') return undefined;
  return Office.context?.document?.settings as unknown as SettingsStore | undefined;
}

/** Builds the pane into the page's #sunpane-root, in the Office theme's colours (followed while the pane is open). */
export function startPane(doc: Document): void {
  followTheme(doc);
  const host: PaneHost = { run: excelRun, settings: documentSettings() };
  createPane(doc, host);
}
