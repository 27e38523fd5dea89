/**
 * Where results go: always a NEW sheet with a unique name, never a user's cells. Sheets the pane
 * made are remembered in the workbook's settings; when the proposed name is taken by one of them,
 * the user is asked (in the pane) whether to replace it or keep both; a name taken by any other
 * sheet simply gets a free variant (`Name (2)`).
 */
import { hasSheetName, uniqueSheetName } from '../io/sheetNames';

/** Runs a batch of Excel requests (Excel.run, or a test host's). */
export type RunBatch = <T>(batch: (ctx: Excel.RequestContext) => Promise<T>) => Promise<T>;

/** The user's answer when a result sheet of the same name exists. */
export type ReplaceAnswer = 'replace' | 'keepBoth' | 'cancel';

/** Asks the user (an in-pane dialog) about an existing result sheet. */
export type AskReplace = (sheetName: string) => Promise<ReplaceAnswer>;

/** Remembers which sheets the pane wrote (stored with the workbook by the settings module). */
export interface ResultSheetBook {
  isOurs(name: string): boolean;
  remember(name: string): void;
  forget(name: string): void;
}

/** What to do about the target sheet. */
export interface SheetPlan {
  /** Name the new sheet gets. */
  name: string;
  /** An earlier result sheet to delete first (the user agreed), if any. */
  replaces?: string;
}

/** Thrown when the user stops a run (Cancel, or "no" to replacing). Nothing is left half-written. */
export class RunCancelled extends Error {
  constructor(message = 'Stopped: nothing was written.') {
    super(message);
    this.name = 'RunCancelled';
  }
}

/** Names of all sheets in the workbook. */
export async function sheetNamesOf(run: RunBatch): Promise<string[]> {
  return run(async (ctx) => {
    const sheets = ctx.workbook.worksheets;
    sheets.load('items/name');
    await ctx.sync();
    return sheets.items.map((s) => s.name);
  });
}

/**
 * Decides the target sheet's name: `base` when free; when an earlier result sheet of ours has it,
 * asks; when a sheet of the user's has it, picks `base (2)`….
 */
export function planSheet(base: string, existing: readonly string[], book: ResultSheetBook, ask: AskReplace): Promise<SheetPlan> {
  const name = uniqueSheetName(base, []);
  if (!hasSheetName(existing, name)) return Promise.resolve({ name });
  const taken = existing.find((s) => s.toLowerCase() === name.toLowerCase()) ?? name;
  if (!book.isOurs(taken)) return Promise.resolve({ name: uniqueSheetName(name, existing) });
  return ask(taken).then((answer) => {
    if (answer === 'cancel') throw new RunCancelled('Stopped: the earlier result sheet was kept and nothing was written.');
    if (answer === 'replace') return { name: taken, replaces: taken };
    return { name: uniqueSheetName(name, existing) };
  });
}
