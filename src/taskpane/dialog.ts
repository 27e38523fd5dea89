/**
 * The pane's own confirm dialog (window.confirm is not available to add-ins): asks whether to
 * replace an earlier result sheet, keep both, or stop. The safe choice has the focus: Enter keeps
 * both; replacing — the destructive choice — takes a deliberate move. Keyboard: Tab and Shift+Tab
 * stay inside the dialog, Escape stops.
 */
import { h } from './dom';
import type { ReplaceAnswer } from './resultSheets';

/** Builds the (hidden) dialog into `root` and returns the function that asks. */
export function makeReplaceDialog(doc: Document, root: HTMLElement): (sheetName: string) => Promise<ReplaceAnswer> {
  const text = h(doc, 'p', { id: 'confirm-text' });
  const keep = h(doc, 'button', { type: 'button', id: 'confirm-keep', className: 'primary' }, 'Keep both');
  const replace = h(doc, 'button', { type: 'button', id: 'confirm-replace' }, 'Replace it');
  const stop = h(doc, 'button', { type: 'button', id: 'confirm-cancel' }, 'Cancel');
  const buttons = [keep, replace, stop];
  const box = h(doc, 'div', { id: 'confirm', className: 'dialog', role: 'alertdialog', 'aria-modal': 'true', 'aria-labelledby': 'confirm-title', 'aria-describedby': 'confirm-text' },
    h(doc, 'h2', { id: 'confirm-title' }, 'Replace an earlier result?'), text, h(doc, 'div', { className: 'buttons' }, ...buttons));
  const backdrop = h(doc, 'div', { className: 'backdrop', id: 'confirm-backdrop' }, box);
  backdrop.hidden = true;
  root.append(backdrop);

  return (sheetName: string) =>
    new Promise<ReplaceAnswer>((resolve) => {
      const before = doc.activeElement as HTMLElement | null;
      text.textContent = `The sheet "${sheetName}" holds an earlier Sunpane result. Keep both (the new result gets a sheet of its own), replace the earlier one, or cancel?`;
      backdrop.hidden = false;
      const done = (answer: ReplaceAnswer) => {
        backdrop.hidden = true;
        keep.onclick = replace.onclick = stop.onclick = null;
        box.onkeydown = null;
        before?.focus?.();
        resolve(answer);
      };
      keep.onclick = () => done('keepBoth');
      replace.onclick = () => done('replace');
      stop.onclick = () => done('cancel');
      box.onkeydown = (e) => {
        if (e.key === 'Escape') {
          e.preventDefault();
          done('cancel');
        } else if (e.key === 'Tab') {
          // Focus stays in the dialog while it is open.
          const i = buttons.indexOf(doc.activeElement as HTMLButtonElement);
          const next = buttons[(i + (e.shiftKey ? buttons.length - 1 : 1) + buttons.length) % buttons.length];
          e.preventDefault();
          next.focus();
        }
      };
      keep.focus();
    });
}
