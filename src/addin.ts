/**
 * The composition root of the one shared-runtime bundle (taskpane.js): the worksheet functions and
 * the task pane live in the same JavaScript context (XML manifest, SharedRuntime 1.1).
 *
 * On Office.onReady it associates every worksheet function and starts the pane. Opened outside
 * Office (a plain browser, office.js blocked), it still shows the pane and registers nothing.
 */
import { registerFunctions } from './functions/register';
import { startPane } from './taskpane';

function start(): void {
  registerFunctions();
  startPane(document);
}

if (typeof Office !== 'undefined' && typeof Office.onReady === 'function') {
  Office.onReady(() => start());
} else if (document.readyState === 'loading') {
  document.addEventListener('DOMContentLoaded', start, { once: true });
} else {
  start();
}
