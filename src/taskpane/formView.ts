/**
 * The window form in the DOM: one labelled box per field, grouped by section, each with its hint
 * and a message line for the core's validation message.
 */
import { h } from './dom';
import { FIELDS, type FieldDef, type FormValues, SECTIONS } from './fields';
import { inUserWords, withoutPath } from './messages';
import type { FormProblems } from './spec';

function control(doc: Document, f: FieldDef, value: string): HTMLInputElement | HTMLSelectElement {
  const describedBy = `${f.id}-msg${f.hint ? ` ${f.id}-hint` : ''}`;
  if (f.kind === 'select') {
    const sel = h(doc, 'select', { id: f.id, name: f.id, 'aria-describedby': describedBy });
    for (const o of f.options ?? []) sel.append(h(doc, 'option', { value: o.value, selected: o.value === value }, o.label));
    sel.value = value;
    return sel;
  }
  const numeric = f.kind === 'number' || f.kind === 'list';
  const input = h(doc, 'input', {
    id: f.id,
    name: f.id,
    type: 'text',
    autocomplete: 'off',
    spellcheck: 'false',
    inputmode: numeric && f.kind === 'number' ? 'decimal' : undefined,
    'aria-describedby': describedBy,
  });
  input.value = value;
  return input;
}

/** Builds the form's sections into `root`. */
export function renderForm(doc: Document, root: HTMLElement, values: FormValues): void {
  for (const s of SECTIONS) {
    const set = h(doc, 'fieldset', { id: `section-${s.id}` }, h(doc, 'legend', {}, s.title));
    for (const f of FIELDS.filter((x) => x.section === s.id)) {
      const label = h(doc, 'label', { for: f.id }, f.label, f.unit ? h(doc, 'span', { className: 'unit' }, ` (${f.unit})`) : undefined);
      const wrap = h(doc, 'div', { className: `field field-${f.kind}`, id: `${f.id}-field` }, label, control(doc, f, values[f.id] ?? f.initial));
      if (f.hint) wrap.append(h(doc, 'div', { className: 'hint', id: `${f.id}-hint` }, f.hint));
      wrap.append(h(doc, 'div', { className: 'msg', id: `${f.id}-msg`, role: 'alert' }));
      set.append(wrap);
    }
    root.append(set);
  }
}

/** Reads every box. */
export function readForm(doc: Document): FormValues {
  const v: FormValues = {};
  for (const f of FIELDS) {
    const el = doc.getElementById(f.id) as HTMLInputElement | HTMLSelectElement | null;
    v[f.id] = el ? el.value : f.initial;
  }
  return v;
}

/** Writes values into the boxes. */
export function fillForm(doc: Document, values: FormValues): void {
  for (const f of FIELDS) {
    const el = doc.getElementById(f.id) as HTMLInputElement | HTMLSelectElement | null;
    if (el && values[f.id] !== undefined) el.value = values[f.id];
  }
}

/** Shows only the fields that apply (glass model, weather source). */
export function applyVisibility(doc: Document, values: FormValues): void {
  for (const f of FIELDS) {
    const wrap = doc.getElementById(`${f.id}-field`);
    if (wrap) wrap.hidden = f.visible ? !f.visible(values) : false;
  }
}

/** Puts each problem beside its box (and clears the others); returns how many boxes are marked. */
export function showProblems(doc: Document, problems: FormProblems, general: HTMLElement): number {
  let marked = 0;
  for (const f of FIELDS) {
    const msg = doc.getElementById(`${f.id}-msg`);
    const el = doc.getElementById(f.id);
    // The core's message, naming the box by its label rather than by the window's field path.
    const text = problems.byField[f.id] ? inUserWords(problems.byField[f.id], f.label) : '';
    if (msg) msg.textContent = text;
    if (el) {
      if (text) el.setAttribute('aria-invalid', 'true');
      else el.removeAttribute('aria-invalid');
    }
    if (text) marked++;
  }
  general.textContent = problems.general.map((m) => withoutPath(m)).join(' ');
  return marked;
}
