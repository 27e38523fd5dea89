/**
 * The pane's state saved with the workbook (Office document settings, saved with saveAsync), so
 * that reopening the workbook restores the form, the shading options, the schedule table name and
 * the list of sheets the pane wrote.
 */
import { MAX_OPTIONS, type ShadingOption, starterOptions } from './compare';
import { FIELDS, type FormValues, initialValues } from './fields';
import type { ResultSheetBook } from './resultSheets';

/** Settings key under which the pane keeps its state. */
export const SETTINGS_KEY = 'sunpane.pane';
/** Version of the saved shape. */
export const SAVED_VERSION = 1;

export interface SavedPane {
  version: number;
  form: FormValues;
  options: ShadingOption[];
  scheduleTable: string;
  resultSheets: string[];
}

/** The minimal settings interface (Office.context.document.settings). */
export interface SettingsStore {
  get(key: string): unknown;
  set(key: string, value: unknown): void;
  saveAsync(callback?: (result: { status: string }) => void): void;
}

/** A fresh state. */
export function freshState(): SavedPane {
  return { version: SAVED_VERSION, form: initialValues(), options: starterOptions(), scheduleTable: 'WindowList', resultSheets: [] };
}

/** Reads saved state, keeping only known fields (unknown or damaged entries fall back to defaults). */
export function restoreState(raw: unknown): SavedPane {
  const state = freshState();
  if (!raw || typeof raw !== 'object') return state;
  const r = raw as Partial<SavedPane>;
  if (r.form && typeof r.form === 'object') {
    for (const f of FIELDS) {
      const saved = r.form as Record<string, unknown>;
      const v = [f.id, ...(f.formerIds ?? [])].map((id) => saved[id]).find((x) => typeof x === 'string');
      if (typeof v === 'string') state.form[f.id] = v;
    }
  }
  if (Array.isArray(r.options)) {
    state.options = r.options.slice(0, MAX_OPTIONS).map((o) => ({ ...starterOptions()[0], ...Object.fromEntries(Object.entries(o ?? {}).filter(([, v]) => typeof v === 'string')) }) as ShadingOption);
  }
  if (typeof r.scheduleTable === 'string') state.scheduleTable = r.scheduleTable;
  if (Array.isArray(r.resultSheets)) state.resultSheets = r.resultSheets.filter((s): s is string => typeof s === 'string');
  return state;
}

/** Keeps the pane's state in a settings store, saving with the workbook. */
export class PaneStore implements ResultSheetBook {
  state: SavedPane;
  private timer: ReturnType<typeof setTimeout> | undefined;

  constructor(private readonly store: SettingsStore | undefined) {
    this.state = restoreState(store?.get(SETTINGS_KEY));
  }

  /** Saves now (set + saveAsync). */
  save(): Promise<void> {
    if (this.timer) clearTimeout(this.timer);
    this.timer = undefined;
    const store = this.store;
    if (!store) return Promise.resolve();
    store.set(SETTINGS_KEY, JSON.parse(JSON.stringify(this.state)));
    return new Promise((resolve) => store.saveAsync(() => resolve()));
  }

  /** Saves shortly (typing in the form saves once it pauses). */
  saveSoon(delayMs = 400): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.save(), delayMs);
  }

  isOurs(name: string): boolean {
    return this.state.resultSheets.some((s) => s.toLowerCase() === name.toLowerCase());
  }

  remember(name: string): void {
    if (!this.isOurs(name)) this.state.resultSheets.push(name);
    void this.save();
  }

  forget(name: string): void {
    this.state.resultSheets = this.state.resultSheets.filter((s) => s.toLowerCase() !== name.toLowerCase());
  }
}
