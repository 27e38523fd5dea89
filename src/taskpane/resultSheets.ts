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

/**
 * Thrown when Excel refuses a request part-way through writing a result sheet: the half-written
 * sheet has been removed (the workbook is as before the run, apart from an earlier result sheet the
 * user had agreed to replace), and the message says so with Excel's own reason.
 */
export class WriteFailed extends Error {
  constructor(sheet: string, cause: unknown) {
    super(`Excel refused a request while writing "${sheet}", so the half-written sheet was removed and nothing else changed. Excel said: ${(cause as Error)?.message ?? String(cause)}`);
    this.name = 'WriteFailed';
  }
}

/** Deletes a sheet if it is there (after a refused request, or a stop). */
export async function removeSheetIfThere(run: RunBatch, name: string): Promise<void> {
  await run(async (ctx) => {
    const sheet = ctx.workbook.worksheets.getItemOrNullObject(name);
    await ctx.sync();
    if (!sheet.isNullObject) {
      sheet.delete();
      await ctx.sync();
    }
  });
}

/**
 * Runs the writing of a new result sheet: when Excel refuses any of its requests, the sheet is
 * removed and {@link WriteFailed} thrown; a {@link RunCancelled} passes through (its writer has
 * already removed what it wrote).
 */
export async function writingSheet<T>(run: RunBatch, name: string, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (err) {
    if (err instanceof RunCancelled) throw err;
    try {
      await removeSheetIfThere(run, name);
    } catch {
      // the host refuses even the clean-up: the message below still tells the user what happened
    }
    throw new WriteFailed(name, err);
  }
}

/** The first words of every sheet title the pane writes ("Sunpane hourly solar gain: …"). */
export const TITLE_MARK = 'Sunpane ';

/**
 * Whether a sheet the settings remember as ours still is: its first cell still holds one of our
 * titles. A sheet the user has since made under that name (or written over) is theirs again.
 */
export async function stillOurs(run: RunBatch, name: string): Promise<boolean> {
  return run(async (ctx) => {
    const cell = ctx.workbook.worksheets.getItem(name).getRange('A1');
    cell.load('values');
    await ctx.sync();
    const v = cell.values?.[0]?.[0];
    return typeof v === 'string' && v.startsWith(TITLE_MARK);
  });
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
 * asks; when a sheet of the user's has it, picks `base (2)`…. A sheet counts as ours only when the
 * settings remember it AND `ours` confirms it still carries our title (default: the settings alone).
 */
export async function planSheet(base: string, existing: readonly string[], book: ResultSheetBook, ask: AskReplace, ours: (name: string) => Promise<boolean> = async () => true): Promise<SheetPlan> {
  const name = uniqueSheetName(base, []);
  if (!hasSheetName(existing, name)) return { name };
  const taken = existing.find((s) => s.toLowerCase() === name.toLowerCase()) ?? name;
  if (!book.isOurs(taken) || !(await ours(taken))) {
    if (book.isOurs(taken)) book.forget(taken);
    return { name: uniqueSheetName(name, existing) };
  }
  return ask(taken).then((answer) => {
    if (answer === 'cancel') throw new RunCancelled('Stopped: the earlier result sheet was kept and nothing was written.');
    if (answer === 'replace') return { name: taken, replaces: taken };
    return { name: uniqueSheetName(name, existing) };
  });
}
