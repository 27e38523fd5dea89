/**
 * The pane's own confirm dialog (window.confirm is not available to add-ins): asks whether to
 * replace an earlier result sheet, keep both, or stop. Keyboard: Tab moves between the buttons,
 * Escape stops.
 */
import { h } from './dom';
import type { ReplaceAnswer } from './resultSheets';

/** Builds the (hidden) dialog into `root` and returns the function that asks. */
export function makeReplaceDialog(doc: Document, root: HTMLElement): (sheetName: string) => Promise<ReplaceAnswer> {
  const text = h(doc, 'p', { id: 'confirm-text' });
  const replace = h(doc, 'button', { type: 'button', id: 'confirm-replace', className: 'primary' }, 'Replace it');
  const keep = h(doc, 'button', { type: 'button', id: 'confirm-keep' }, 'Keep both');
  const stop = h(doc, 'button', { type: 'button', id: 'confirm-cancel' }, 'Cancel');
  const box = h(doc, 'div', { id: 'confirm', className: 'dialog', role: 'dialog', 'aria-modal': 'true', 'aria-labelledby': 'confirm-title', 'aria-describedby': 'confirm-text' },
    h(doc, 'h2', { id: 'confirm-title' }, 'Replace an earlier result?'), text, h(doc, 'div', { className: 'buttons' }, replace, keep, stop));
  const backdrop = h(doc, 'div', { className: 'backdrop', id: 'confirm-backdrop' }, box);
  backdrop.hidden = true;
  root.append(backdrop);

  return (sheetName: string) =>
    new Promise<ReplaceAnswer>((resolve) => {
      const before = doc.activeElement as HTMLElement | null;
      text.textContent = `The sheet "${sheetName}" holds an earlier Sunpane result. Replace it with the new one, keep both (the new one gets its own name), or cancel?`;
      backdrop.hidden = false;
      const done = (answer: ReplaceAnswer) => {
        backdrop.hidden = true;
        replace.onclick = keep.onclick = stop.onclick = null;
        box.onkeydown = null;
        before?.focus?.();
        resolve(answer);
      };
      replace.onclick = () => done('replace');
      keep.onclick = () => done('keepBoth');
      stop.onclick = () => done('cancel');
      box.onkeydown = (e) => {
        if (e.key === 'Escape') done('cancel');
      };
      replace.focus();
    });
}
