/**
 * A small, strict XML reader for the manifest tests (no dependency): elements, attributes, text,
 * comments, the XML declaration and CDATA; entities &lt; &gt; &amp; &quot; &apos; and numeric ones.
 * It refuses what a real parser would refuse in a manifest: mismatched or unclosed tags, duplicate
 * attributes, unquoted attribute values, text after the root.
 */
export interface XmlElement {
  /** Qualified name as written, e.g. `bt:Image`. */
  name: string;
  attributes: Record<string, string>;
  children: XmlElement[];
  /** Concatenated text directly inside this element, trimmed. */
  text: string;
  parent?: XmlElement;
}

function decodeEntities(s: string, at: number): string {
  return s.replace(/&(#x[0-9a-fA-F]+|#[0-9]+|lt|gt|amp|quot|apos);|&/g, (m, e: string | undefined) => {
    if (e === undefined) throw new Error(`XML: bare & near offset ${at}`);
    if (e.startsWith('#x')) return String.fromCodePoint(parseInt(e.slice(2), 16));
    if (e.startsWith('#')) return String.fromCodePoint(parseInt(e.slice(1), 10));
    return ({ lt: '<', gt: '>', amp: '&', quot: '"', apos: "'" } as Record<string, string>)[e];
  });
}

const NAME = /^[A-Za-z_][\w.:-]*/;

/** Parses a document; returns its root element. Throws Error with an offset on malformed input. */
export function parseXml(xml: string): XmlElement {
  let i = 0;
  const stack: XmlElement[] = [];
  let root: XmlElement | undefined;
  const texts = new Map<XmlElement, string[]>();
  const fail = (msg: string): never => {
    throw new Error(`XML: ${msg} at offset ${i}`);
  };
  while (i < xml.length) {
    if (xml.startsWith('<!--', i)) {
      const end = xml.indexOf('-->', i + 4);
      if (end < 0) fail('unclosed comment');
      i = end + 3;
    } else if (xml.startsWith('<?', i)) {
      const end = xml.indexOf('?>', i + 2);
      if (end < 0) fail('unclosed declaration');
      i = end + 2;
    } else if (xml.startsWith('<![CDATA[', i)) {
      const end = xml.indexOf(']]>', i);
      if (end < 0 || stack.length === 0) fail('CDATA outside an element or unclosed');
      texts.get(stack[stack.length - 1])?.push(xml.slice(i + 9, end));
      i = end + 3;
    } else if (xml.startsWith('</', i)) {
      const end = xml.indexOf('>', i);
      if (end < 0) fail('unclosed end tag');
      const name = xml.slice(i + 2, end).trim();
      const open = stack.pop();
      if (!open || open.name !== name) fail(`end tag </${name}> does not match <${open?.name ?? '(none)'}>`);
      i = end + 1;
    } else if (xml[i] === '<') {
      i++;
      const m = NAME.exec(xml.slice(i));
      if (!m) fail('bad element name');
      const el: XmlElement = { name: m![0], attributes: {}, children: [], text: '' };
      i += m![0].length;
      for (;;) {
        while (/\s/.test(xml[i] ?? '')) i++;
        if (xml.startsWith('/>', i) || xml[i] === '>') break;
        const a = NAME.exec(xml.slice(i));
        if (!a) fail(`bad attribute in <${el.name}>`);
        i += a![0].length;
        while (/\s/.test(xml[i] ?? '')) i++;
        if (xml[i] !== '=') fail(`attribute ${a![0]} without a value`);
        i++;
        while (/\s/.test(xml[i] ?? '')) i++;
        const q = xml[i];
        if (q !== '"' && q !== "'") fail(`unquoted value of ${a![0]}`);
        const end = xml.indexOf(q, i + 1);
        if (end < 0) fail('unclosed attribute value');
        if (a![0] in el.attributes) fail(`duplicate attribute ${a![0]}`);
        el.attributes[a![0]] = decodeEntities(xml.slice(i + 1, end), i);
        i = end + 1;
      }
      const parent = stack[stack.length - 1];
      if (parent) {
        el.parent = parent;
        parent.children.push(el);
      } else if (root) fail('a second root element');
      else root = el;
      texts.set(el, []);
      if (xml.startsWith('/>', i)) i += 2;
      else {
        i++;
        stack.push(el);
      }
    } else {
      const next = xml.indexOf('<', i);
      const chunk = xml.slice(i, next < 0 ? xml.length : next);
      if (stack.length === 0) {
        if (chunk.trim() !== '') fail('text outside the root element');
      } else texts.get(stack[stack.length - 1])?.push(decodeEntities(chunk, i));
      i = next < 0 ? xml.length : next;
    }
  }
  if (stack.length > 0) fail(`unclosed <${stack[stack.length - 1].name}>`);
  if (!root) fail('no root element');
  for (const [el, parts] of texts) el.text = parts.join('').trim();
  return root!;
}

/** Every element below (and including) `el`, document order. */
export function allElements(el: XmlElement): XmlElement[] {
  return [el, ...el.children.flatMap(allElements)];
}

/** The local name (without prefix). */
export function localName(el: XmlElement): string {
  return el.name.includes(':') ? el.name.slice(el.name.indexOf(':') + 1) : el.name;
}

/** Direct children with the given local name. */
export function childrenNamed(el: XmlElement, name: string): XmlElement[] {
  return el.children.filter((c) => localName(c) === name);
}

/** Follows a path of local names from `el`; throws naming the first step that is missing. */
export function at(el: XmlElement, ...names: string[]): XmlElement {
  let cur = el;
  for (const n of names) {
    const next = childrenNamed(cur, n)[0];
    if (!next) throw new Error(`manifest: <${cur.name}> has no <${n}>`);
    cur = next;
  }
  return cur;
}
