/**
 * The composition root of the one shared-runtime bundle (taskpane.js): the worksheet functions and
 * the task pane live in the same JavaScript context (XML manifest, SharedRuntime 1.1).
 *
 * The worksheet functions are associated as soon as the bundle runs, when office.js (loaded by a
 * blocking script tag before the bundle) already provides CustomFunctions: associating only after
 * an asynchronous step has been reported to make the first call of a function show #VALUE!. If
 * CustomFunctions is not there yet, they are associated on Office.onReady. The pane starts on
 * Office.onReady. Opened outside Office (a plain browser, office.js blocked), the pane still shows
 * and nothing is registered.
 */
import { registerFunctions } from './functions/register';
import { startPane } from './taskpane';

let registered = false;

function registerOnce(): void {
  if (!registered) registered = registerFunctions().length > 0;
}

function start(): void {
  registerOnce();
  startPane(document);
}

registerOnce();
if (typeof Office !== 'undefined' && typeof Office.onReady === 'function') {
  Office.onReady(() => start());
} else if (document.readyState === 'loading') {
  document.addEventListener('DOMContentLoaded', start, { once: true });
} else {
  start();
}
