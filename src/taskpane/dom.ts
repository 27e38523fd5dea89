/** Small DOM helpers for the pane (no framework). */

type Attrs = Record<string, string | number | boolean | undefined>;

/** Creates an element with attributes and children (strings become text). */
export function h<K extends keyof HTMLElementTagNameMap>(doc: Document, tag: K, attrs: Attrs = {}, ...children: (Node | string | undefined)[]): HTMLElementTagNameMap[K] {
  const el = doc.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) {
    if (v === undefined || v === false) continue;
    if (k === 'className') el.className = String(v);
    else if (k === 'text') el.textContent = String(v);
    else el.setAttribute(k, v === true ? '' : String(v));
  }
  for (const c of children) if (c !== undefined) el.append(typeof c === 'string' ? doc.createTextNode(c) : c);
  return el;
}

/** Looks an element up by id, failing loudly when the pane's markup is not as built. */
export function byId<T extends HTMLElement = HTMLElement>(doc: Document, id: string): T {
  const el = doc.getElementById(id);
  if (!el) throw new Error(`pane element #${id} is missing`);
  return el as T;
}

/** Shows or hides an element. */
export function show(el: HTMLElement, visible: boolean): void {
  el.hidden = !visible;
}
