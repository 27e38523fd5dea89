/**
 * The pane's controller: builds the tabs (window, schedule, options, sun path), keeps the form in
 * the workbook's settings, and runs the actions — each builds WindowSpecs, calls the core through
 * engine.ts and writes to a new sheet through the Excel request context it is given.
 */
import { SunpaneError } from '../core/common';
import { CAUTION } from '../outputs/caution';
import type { WindowSpec } from '../core/gain';
import { MAX_OPTIONS, OPTION_FIELDS, OptionProblem, PEAK_LOAD_COLUMN, type ShadingOption, compareFormats, compareHeader, comparisonRows, optionSpecs } from './compare';
import { makeReplaceDialog } from './dialog';
import { byId, h } from './dom';
import { type YearResult, runYear, validateSpec } from './engine';
import { FIELD_BY_ID, type FormValues, applyExampleSite, fieldForArgument } from './fields';
import { inUserWords } from './messages';
import { applyVisibility, fillForm, readForm, renderForm, showProblems } from './formView';
import { PaneStore, type SettingsStore } from './persist';
import { type AskReplace, type RunBatch, RunCancelled, WriteFailed, planSheet, sheetNamesOf, stillOurs } from './resultSheets';
import { SCHEDULE_HELP, readSchedule, summaryFormats, summaryHeader, summaryRow } from './schedule';
import { LOAD_WORDS } from '../registry/glossary';
import { compareSummaryText, roomText, scheduleLoadLine, scheduleSummaryText } from './loadText';
import { readNamedTable, readSheetData, withCheckedWeather } from './sheetData';
import { type SheetData, buildWindowSpec, findProblems, isClean } from './spec';
import { drawSunPath } from './sunPathView';
import { writeSmallTableSheet } from './tableSheet';
import { workbookDateSystem } from './dateSystem';
import { writeYearSheet } from './yearSheet';
import { type DateSystem, describeDaylightSaving, utcOffsetText } from '../core/time';
import { scheduleConventionOf } from '../schedule/columns';

/** The caution shown in the pane and on every result sheet (one text for every output). */
export { CAUTION };

/** What the pane needs from its host. */
export interface PaneHost {
  run: RunBatch;
  settings?: SettingsStore;
}

const TABS = [
  { id: 'window', title: 'Window' },
  { id: 'schedule', title: 'Schedule' },
  { id: 'options', title: 'Options' },
  { id: 'sunpath', title: 'Sun path' },
] as const;

function weatherText(spec: WindowSpec): string {
  switch (spec.weather.kind) {
    case 'ineichenClearSky':
      return `clear sky (Ineichen–Perez), Linke turbidity ${spec.weather.linkeTurbidity.join(', ')}`;
    case 'ashraeClearSky':
      return `clear sky (ASHRAE), τb ${spec.weather.tauB.join(', ')}, τd ${spec.weather.tauD.join(', ')}`;
    case 'measured':
      return 'hourly direct normal + diffuse horizontal from the workbook';
    default:
      return 'hourly global horizontal from the workbook, split by Erbs et al. (1982)';
  }
}

/**
 * How the rows are stamped, in words: the time convention, and the clock — local standard time, or
 * under a daylight-saving rule the local clock with the rule in words (as SOLARGAINSTEPS states it).
 */
function rowsText(spec: WindowSpec): string {
  const rule = spec.site.daylightSaving;
  const clock = rule ? `on the local clock (${describeDaylightSaving(rule)})` : 'local standard time';
  return spec.timeConvention === 'instant' ? `Rows are instants at the top of each hour, ${clock}, sun at the stamp (time convention instant).` : `Rows are hour-ending, ${clock}, sun at mid-hour (time convention hourEnding).`;
}

/** The description lines above a result. */
export function describeSpec(spec: WindowSpec): string[] {
  const s = spec.site;
  return [
    `${spec.name}: faces ${spec.surfaceAzimuth}°, tilt ${spec.surfaceTilt}°, opening ${spec.width} × ${spec.height} m, frame share ${spec.frameFraction}, SHGC ${spec.glazing.shgc}${spec.glazing.angleTable ? ' (angle table)' : `, ${spec.glazing.panes} panes`}`,
    `Latitude ${s.latitude}°, longitude ${s.longitude}°, ${utcOffsetText(s.utcOffset)}, year ${spec.year}; ${weatherText(spec)}; sky model ${spec.skyModel}; ground reflectance ${spec.groundAlbedo}. ${rowsText(spec)}`,
    CAUTION,
  ];
}

/** Builds the pane into `doc` and wires it to `host`. */
export function createPane(doc: Document, host: PaneHost): void {
  const root = byId(doc, 'sunpane-root');
  root.textContent = '';
  const store = new PaneStore(host.settings);
  const state = store.state;

  // ---- frame: heading, caution, tabs, the scrolling panels, and a footer that always shows the
  // primary action of the tab in view (reachable at the pane's narrowest without scrolling) --------
  root.append(
    h(doc, 'header', { className: 'brand' }, h(doc, 'span', { className: 'mark', 'aria-hidden': 'true' }), h(doc, 'div', {}, h(doc, 'h1', {}, 'Sunpane'), h(doc, 'p', {}, 'Sun and shade on a window, hour by hour'))),
    h(doc, 'p', { className: 'caution', id: 'caution', role: 'note' }, CAUTION),
  );
  const tablist = h(doc, 'div', { role: 'tablist', className: 'tabs', 'aria-label': 'Pane sections' });
  const panelBox = h(doc, 'main', { className: 'panels', id: 'panels' });
  root.append(tablist, panelBox);
  const panels: Record<string, HTMLElement> = {};
  for (const t of TABS) {
    const b = h(doc, 'button', { type: 'button', role: 'tab', id: `tab-${t.id}`, 'aria-controls': `panel-${t.id}` }, t.title);
    b.addEventListener('click', () => selectTab(t.id));
    b.addEventListener('keydown', (e) => {
      const i = TABS.findIndex((x) => x.id === t.id);
      const to = e.key === 'ArrowRight' ? i + 1 : e.key === 'ArrowLeft' ? i - 1 : e.key === 'Home' ? 0 : e.key === 'End' ? TABS.length - 1 : undefined;
      if (to === undefined) return;
      e.preventDefault();
      const next = TABS[(to + TABS.length) % TABS.length];
      selectTab(next.id);
      byId(doc, `tab-${next.id}`).focus();
    });
    tablist.append(b);
    panels[t.id] = h(doc, 'section', { role: 'tabpanel', id: `panel-${t.id}`, 'aria-labelledby': `tab-${t.id}`, tabindex: 0 });
    panelBox.append(panels[t.id]);
  }
  const progress = h(doc, 'div', { id: 'progress', className: 'progress' },
    h(doc, 'label', { for: 'progress-bar', id: 'progress-text' }, 'Working…'),
    h(doc, 'progress', { id: 'progress-bar', max: 1, value: 0 }),
    h(doc, 'button', { type: 'button', id: 'cancel' }, 'Cancel'));
  progress.hidden = true;
  const status = h(doc, 'div', { id: 'status', className: 'status', role: 'status', 'aria-live': 'polite' });
  const footerActions = h(doc, 'div', { className: 'actions', id: 'primary-actions' });
  const footer = h(doc, 'footer', { className: 'footer', id: 'footer' }, progress, status, footerActions);
  root.append(footer);
  const askReplace: AskReplace = makeReplaceDialog(doc, doc.body);
  /** The footer's primary button of each tab. */
  const primaryOf: Record<string, HTMLButtonElement> = {};

  function selectTab(id: string): void {
    for (const t of TABS) {
      const on = t.id === id;
      const b = byId(doc, `tab-${t.id}`);
      b.setAttribute('aria-selected', String(on));
      b.tabIndex = on ? 0 : -1;
      panels[t.id].hidden = !on;
      if (primaryOf[t.id]) primaryOf[t.id].hidden = !on;
    }
    if (id === 'sunpath') void redrawSunPath();
  }

  // ---- window form ---------------------------------------------------------------------------
  const formPanel = panels.window;
  const form = h(doc, 'form', { id: 'window-form', novalidate: true });
  renderForm(doc, form, state.form);
  const formGeneral = h(doc, 'div', { className: 'msg general', id: 'form-msg', role: 'alert' });
  const runYearButton = h(doc, 'button', { type: 'button', id: 'run-year', className: 'primary' }, 'Write hourly year to a new sheet');
  formPanel.append(form, formGeneral);
  primaryOf.window = runYearButton;
  footerActions.append(runYearButton);
  applyVisibility(doc, state.form);

  let checkTimer: ReturnType<typeof setTimeout> | undefined;
  form.addEventListener('input', (e) => onFormEdit(e.target as HTMLElement));
  form.addEventListener('change', (e) => onFormEdit(e.target as HTMLElement));
  form.addEventListener('submit', (e) => e.preventDefault());
  function onFormEdit(target: HTMLElement): void {
    if (target.id === 'examplePlace') {
      const v = applyExampleSite(readForm(doc), (target as HTMLSelectElement).value);
      fillForm(doc, v);
    }
    state.form = readForm(doc);
    applyVisibility(doc, state.form);
    store.saveSoon();
    if (checkTimer) clearTimeout(checkTimer);
    checkTimer = setTimeout(checkForm, 250);
  }
  /**
   * The workbook's date system as Excel last said (1900, the default, until it has answered): a
   * serial typed in a daylight-saving box counts days in it, as the workbook's cells do. Asked when
   * the pane opens and again before each run and drawing (the option can change while the pane is open).
   */
  let dateSystem: DateSystem = 1900;
  async function askDateSystem(): Promise<DateSystem> {
    const system = await workbookDateSystem(host.run);
    if (system !== dateSystem) {
      dateSystem = system;
      checkForm();
    }
    return system;
  }
  function checkForm(): boolean {
    const problems = findProblems(state.form, validateSpec, undefined, dateSystem);
    showProblems(doc, problems, formGeneral);
    return isClean(problems);
  }

  // ---- busy state, progress, cancel ----------------------------------------------------------
  let cancelRequested = false;
  byId(doc, 'cancel').addEventListener('click', () => {
    cancelRequested = true;
    byId(doc, 'progress-text').textContent = 'Stopping after this block…';
  });
  const actionButtons = () => Array.from(root.querySelectorAll<HTMLButtonElement>('button.primary[data-action], #run-year, #run-schedule, #run-compare'));
  function setBusy(busy: boolean, text = 'Working…'): void {
    cancelRequested = false;
    (byId(doc, 'cancel') as HTMLButtonElement).disabled = false;
    progress.hidden = !busy;
    if (busy) progress.scrollIntoView?.({ block: 'nearest' });
    byId(doc, 'progress-text').textContent = text;
    (byId(doc, 'progress-bar') as HTMLProgressElement).value = 0;
    for (const b of actionButtons()) b.disabled = busy;
  }
  function setProgress(done: number, total: number, text: string): void {
    (byId(doc, 'progress-bar') as HTMLProgressElement).value = total > 0 ? done / total : 0;
    if (!cancelRequested) byId(doc, 'progress-text').textContent = text;
  }
  /**
   * The last step writes a small sheet in a few requests that are not stopped half-way: Cancel is
   * switched off and the progress line says so (a stop asked for before this point wrote nothing).
   */
  function writingNow(what: string): void {
    if (cancelRequested) throw new RunCancelled();
    (byId(doc, 'cancel') as HTMLButtonElement).disabled = true;
    byId(doc, 'progress-text').textContent = `Writing ${what}…`;
  }
  /** Where a result goes: a free name, or (asked) one of our earlier result sheets that still carries our title. */
  async function planFor(base: string) {
    const plan = await planSheet(base, await sheetNamesOf(host.run), store, askReplace, (n) => stillOurs(host.run, n));
    store.saveSoon();
    if (cancelRequested) throw new RunCancelled();
    return plan;
  }
  function say(text: string, kind: 'ok' | 'error' | 'info' = 'info'): void {
    status.textContent = text;
    status.className = `status ${kind}`;
  }
  /** Lets the pane repaint between long steps. */
  const breathe = () => new Promise<void>((r) => setTimeout(r, 0));

  /** What the last weather check had to say (problems within the limit, notes), shown under the form. */
  let weatherLines: string[] = [];
  async function withSheetData(values: FormValues): Promise<{ spec: WindowSpec; data: SheetData; dateSystem: DateSystem } | undefined> {
    // The run checks the form itself (below); a check still pending from the last edit would come
    // after the run's own messages and wipe those about the sheet's ranges.
    if (checkTimer) clearTimeout(checkTimer);
    checkTimer = undefined;
    weatherLines = [];
    // The workbook's date system first: the daylight-saving boxes' serials and the weather's serial
    // stamps are read, and the pane's date-times written, in it.
    const system = await askDateSystem();
    if (!checkForm()) {
      say('Fix the marked boxes on the Window tab first.', 'error');
      return undefined;
    }
    let data: SheetData;
    try {
      data = await readSheetData(host.run, values);
    } catch (err) {
      if (err instanceof SunpaneError) {
        showProblems(doc, { byField: fieldMessage(err), general: [] }, formGeneral);
        say(userWords(err), 'error');
        return undefined;
      }
      throw err;
    }
    if (data.weatherRanges) data = { ...data, weatherRanges: { ...data.weatherRanges, dateSystem: system } };
    // Hourly weather: checked as the command line checks it (src/io/weather.ts), for the form's year and site.
    try {
      const base = buildWindowSpec(values, {}, system);
      const checked = withCheckedWeather(data, values, base.site, base.year);
      weatherLines = checked.lines;
      if (!checked.usable) {
        const box = values.weatherSource === 'globalHorizontal' ? 'ghiAddress' : 'dniAddress';
        showProblems(doc, { byField: { [box]: checked.lines[0] ?? '' }, general: checked.lines.slice(1) }, formGeneral);
        say('The weather columns cannot be used: see the Window tab.', 'error');
        return undefined;
      }
      data = checked.data;
    } catch (err) {
      if (err instanceof SunpaneError) {
        showProblems(doc, { byField: fieldMessage(err), general: [] }, formGeneral);
        say(err.message, 'error');
        return undefined;
      }
      throw err;
    }
    const problems = findProblems(values, validateSpec, data, system);
    if (!isClean(problems)) {
      showProblems(doc, problems, formGeneral);
      say('The ranges the form points at hold values the calculation cannot use: see the marked boxes.', 'error');
      return undefined;
    }
    if (weatherLines.length) formGeneral.textContent = weatherLines.join('\n');
    return { spec: buildWindowSpec(values, data, system), data, dateSystem: system };
  }
  function fieldMessage(err: SunpaneError): Record<string, string> {
    for (const [id, f] of FIELD_BY_ID) if ((f.paths ?? []).some((p) => err.argument.startsWith(p))) return { [id]: err.message };
    return {};
  }
  /** A core message named as the user knows the thing refused (a box's label, the table name). */
  function userWords(err: SunpaneError): string {
    if (err.argument === 'table') return inUserWords(err.message, 'Excel table name');
    const field = fieldForArgument(err.argument);
    return field ? inUserWords(err.message, field.label) : err.message;
  }
  function reportFailure(err: unknown): void {
    if (err instanceof RunCancelled) say(err.message, 'info');
    else if (err instanceof WriteFailed) say(err.message, 'error');
    else if (err instanceof SunpaneError) say(userWords(err), 'error');
    else say(`Excel refused the request: ${(err as Error)?.message ?? String(err)}`, 'error');
  }

  runYearButton.addEventListener('click', () => void runYearAction());
  async function runYearAction(): Promise<void> {
    state.form = readForm(doc);
    const ready = await withSheetData(state.form);
    if (!ready) return;
    setBusy(true, 'Working out the year…');
    try {
      await breathe();
      const result: YearResult = runYear(ready.spec);
      const plan = await planFor(`${ready.spec.name} hourly`);
      const written = await writeYearSheet(host.run, { ...plan, tableBase: `${ready.spec.name} hourly` }, { title: `Sunpane hourly solar gain: ${ready.spec.name}`, lines: describeSpec(ready.spec), timeConvention: ready.spec.timeConvention, dateSystem: ready.dateSystem, clock: ready.spec.site.daylightSaving !== undefined }, result.hourly, result.figures, {
        onProgress: (done, total) => setProgress(done, total, `Writing rows: ${done} of ${total}`),
        cancelled: () => cancelRequested,
      });
      store.remember(written.sheet);
      const cuts = `shading takes ${(result.figures.beamCut * 100).toFixed(0)} % of the beam and ${(result.figures.diffuseCut * 100).toFixed(0)} % of the diffuse light`;
      const load = result.figures.peakLoadW !== undefined ? `, peak cooling load ${result.figures.peakLoadW.toFixed(0)} W` : '';
      say(`Wrote "${written.sheet}" (table ${written.table}): ${result.figures.annualKWh.toFixed(0)} kWh in the year, peak ${result.figures.peakW.toFixed(0)} W${load}; ${cuts}.`, 'ok');
    } catch (err) {
      reportFailure(err);
    } finally {
      setBusy(false);
    }
  }

  // ---- schedule ------------------------------------------------------------------------------
  const sched = panels.schedule;
  const tableInput = h(doc, 'input', { id: 'schedule-table', type: 'text', autocomplete: 'off', spellcheck: 'false' });
  tableInput.value = state.scheduleTable;
  tableInput.addEventListener('input', () => {
    state.scheduleTable = tableInput.value;
    store.saveSoon();
  });
  const schedButton = h(doc, 'button', { type: 'button', id: 'run-schedule', className: 'primary' }, 'Run every window in the table');
  const schedProblems = h(doc, 'ul', { id: 'schedule-problems', className: 'problems', role: 'alert' });
  sched.append(
    h(doc, 'p', { className: 'help', id: 'schedule-help' }, SCHEDULE_HELP),
    h(doc, 'p', { className: 'help' }, 'Place, glass model, sky, weather, year and room come from the Window tab unless the row gives them. A window with a room gets its peak cooling load beside its gains.'),
    h(doc, 'div', { className: 'field' }, h(doc, 'label', { for: 'schedule-table' }, 'Excel table name'), tableInput),
    schedProblems,
  );
  primaryOf.schedule = schedButton;
  footerActions.append(schedButton);
  schedButton.addEventListener('click', () => void runScheduleAction());
  async function runScheduleAction(): Promise<void> {
    schedProblems.textContent = '';
    state.form = readForm(doc);
    let table;
    try {
      table = await readNamedTable(host.run, tableInput.value);
    } catch (err) {
      reportFailure(err);
      return;
    }
    const ready = await withSheetData(state.form);
    if (!ready) return;
    const { rows, problems } = readSchedule(table, state.form, validateSpec, ready.data, ready.dateSystem);
    if (problems.length) {
      for (const p of problems) schedProblems.append(h(doc, 'li', {}, p.message));
      say(`The schedule has ${problems.length} problem${problems.length > 1 ? 's' : ''}; nothing was written.`, 'error');
      return;
    }
    setBusy(true, 'Working out the windows…');
    try {
      const figures: YearResult['figures'][] = [];
      for (const [i, r] of rows.entries()) {
        if (cancelRequested) throw new RunCancelled();
        setProgress(i, rows.length, `Window ${i + 1} of ${rows.length}: ${r.spec.name}`);
        await breathe();
        figures.push(runYear(r.spec).figures);
      }
      const withLoad = figures.some((f) => f.peakLoadW !== undefined);
      const convention = scheduleConventionOf(rows.map((r) => r.spec.timeConvention));
      const out = rows.map((r, i) => summaryRow(r.spec, figures[i], withLoad, convention));
      const plan = await planFor('Schedule results');
      writingNow('the schedule results');
      const name = await writeSmallTableSheet(host.run, plan, {
        title: `Sunpane window schedule: ${rows.length} windows, year ${rows[0].spec.year}`,
        lines: [`From table "${tableInput.value.trim()}"; ${weatherText(rows[0].spec)}.`, scheduleLoadLine(figures), CAUTION],
        header: summaryHeader(withLoad, convention),
        rows: out,
        formats: summaryFormats(withLoad, convention),
        dateSystem: ready.dateSystem,
        chartColumn: 3,
        chartTitle: 'Solar gain by window (kWh/yr)',
      });
      store.remember(name);
      say(`Wrote "${name}" with ${rows.length} windows: ${scheduleSummaryText(rows.map((r) => r.spec.name), figures)}`, 'ok');
    } catch (err) {
      reportFailure(err);
    } finally {
      setBusy(false);
    }
  }

  // ---- options -------------------------------------------------------------------------------
  const opts = panels.options;
  const optTable = h(doc, 'div', { id: 'options-list', className: 'options' });
  const addOption = h(doc, 'button', { type: 'button', id: 'add-option' }, 'Add option');
  const compareButton = h(doc, 'button', { type: 'button', id: 'run-compare', className: 'primary' }, 'Compare on a new sheet');
  const optMsg = h(doc, 'div', { id: 'options-msg', className: 'msg general', role: 'alert' });
  opts.append(
    h(doc, 'p', { className: 'help' }, `The window on the Window tab with up to ${MAX_OPTIONS} sets of outside shading, each against the same window with none (a skyline stays: it is the surroundings). Depths in m; 0 or blank = no such device; the reach is past each jamb. With a room construction on the Window tab, each option gets its peak cooling load too.`),
    optTable,
    optMsg,
    h(doc, 'div', { className: 'actions' }, addOption),
  );
  primaryOf.options = compareButton;
  footerActions.append(compareButton);
  function renderOptions(): void {
    optTable.textContent = '';
    state.options.forEach((o, i) => {
      const card = h(doc, 'fieldset', { className: 'option', id: `opt-${i}` }, h(doc, 'legend', {}, `Option ${i + 1}`));
      for (const c of OPTION_FIELDS) {
        const id = `opt-${i}-${c.key}`;
        const input = h(doc, 'input', { id, type: 'text', autocomplete: 'off', inputmode: c.key === 'label' ? undefined : 'decimal' });
        input.value = o[c.key];
        input.addEventListener('input', () => {
          state.options[i] = { ...state.options[i], [c.key]: input.value };
          store.saveSoon();
        });
        card.append(h(doc, 'div', { className: c.key === 'label' ? 'field wide' : 'field' }, h(doc, 'label', { for: id, title: c.title }, c.short), input));
      }
      const remove = h(doc, 'button', { type: 'button', className: 'link', id: `opt-${i}-remove`, 'aria-label': `Remove option ${i + 1}` }, 'Remove');
      remove.addEventListener('click', () => {
        state.options.splice(i, 1);
        store.saveSoon();
        renderOptions();
      });
      card.append(h(doc, 'div', { className: 'field end' }, remove));
      optTable.append(card);
    });
    addOption.disabled = state.options.length >= MAX_OPTIONS;
  }
  renderOptions();
  addOption.addEventListener('click', () => {
    if (state.options.length >= MAX_OPTIONS) return;
    state.options.push({ label: `Option ${state.options.length + 1}`, overhangDepth: '0', overhangGap: '0', overhangReach: '0', leftFinDepth: '0', rightFinDepth: '0', finGap: '0', setBack: '0' } as ShadingOption);
    store.saveSoon();
    renderOptions();
  });
  compareButton.addEventListener('click', () => void runCompareAction());
  async function runCompareAction(): Promise<void> {
    optMsg.textContent = '';
    state.form = readForm(doc);
    const ready = await withSheetData(state.form);
    if (!ready) return;
    let specs;
    try {
      specs = optionSpecs(ready.spec, state.options, validateSpec);
    } catch (err) {
      if (err instanceof SunpaneError) {
        optMsg.textContent = err instanceof OptionProblem ? err.inUserWords : userWords(err);
        say('An option has a value the calculation cannot use; nothing was written.', 'error');
        return;
      }
      throw err;
    }
    setBusy(true, 'Working out the options…');
    try {
      const results = [];
      for (const [i, o] of specs.entries()) {
        if (cancelRequested) throw new RunCancelled();
        setProgress(i, specs.length, `Option ${i} of ${specs.length - 1}: ${o.label}`);
        await breathe();
        results.push({ label: o.label, figures: runYear(o.spec).figures });
      }
      if (cancelRequested) throw new RunCancelled();
      // Every option has the form's room, so the load columns come for all or none.
      const withLoad = results[0].figures.peakLoadW !== undefined;
      const plan = await planFor(`${ready.spec.name} options`);
      writingNow('the comparison');
      const name = await writeSmallTableSheet(host.run, plan, {
        title: `Sunpane shading options: ${ready.spec.name}`,
        lines: [
          ...describeSpec(ready.spec).slice(0, 2),
          'Cut = 1 − annual gain ÷ annual gain with no outside shading. Beam and diffuse cuts: the share of the year’s beam, and of its sky and ground light, that the shading (devices and skyline) keeps off the glass. Shaded share = 1 − mean sunlit fraction over the hours the sun is in front of the wall.',
          withLoad
            ? `${LOAD_WORDS.peakLoad}: the year’s largest hourly cooling load of the window by the radiant time series (${roomText(ready.spec)}), the sizing figure; ${LOAD_WORDS.peakLoadCut} = 1 − peak load ÷ peak load with no outside shading.`
            : `Cooling load: ${LOAD_WORDS.noRoom} (choose a room construction on the Window tab for the peak cooling load of each option).`,
          CAUTION,
        ],
        header: compareHeader(withLoad),
        rows: comparisonRows(results, withLoad),
        formats: compareFormats(withLoad),
        dateSystem: ready.dateSystem,
        chartColumn: 1,
        chartTitle: 'Solar gain by shading option (kWh/yr)',
        ...(withLoad ? { moreCharts: [{ column: PEAK_LOAD_COLUMN, title: 'Peak cooling load by shading option (W)' }] } : {}),
      });
      store.remember(name);
      say(`Wrote "${name}" comparing ${specs.length - 1} options: ${compareSummaryText(results)}`, 'ok');
    } catch (err) {
      reportFailure(err);
    } finally {
      setBusy(false);
    }
  }

  // ---- sun path ------------------------------------------------------------------------------
  const sunPath = drawSunPath(doc, panels.sunpath, () => {
    state.form = readForm(doc);
    return state.form;
  }, validateSpec, host.run, () => askDateSystem().catch(() => dateSystem));
  const redrawSunPath = sunPath.redraw;
  primaryOf.sunpath = sunPath.drawButton;
  footerActions.append(sunPath.drawButton);

  selectTab('window');
  checkForm();
  // A workbook in the 1904 system: the form is checked again once Excel has said so (a failed
  // request leaves 1900 until the next run asks again).
  void askDateSystem().catch(() => undefined);
}
