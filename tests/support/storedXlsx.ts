/**
 * A workbook's cells as stored in the file (the XML parts, shared strings resolved), not as a reader
 * that converts date cells shows them: for the checks of the date system, where the stored serial
 * is the point.
 */
import * as fs from 'node:fs';
import JSZip from 'jszip';

/** One stored cell: its value text, its formula, its style index. */
export interface StoredCell {
  v?: string;
  f?: string;
  s?: string;
}

/** The workbook part's XML and every sheet's cells by address. */
export interface StoredWorkbook {
  workbook: string;
  sheets: Map<string, Map<string, StoredCell>>;
}

const unescape = (t: string) => t.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&apos;/g, "'").replace(/&amp;/g, '&');

/** Reads a workbook's stored cells. */
export async function storedWorkbook(file: string): Promise<StoredWorkbook> {
  const zip = await JSZip.loadAsync(fs.readFileSync(file));
  const workbook = await zip.file('xl/workbook.xml')!.async('string');
  const rels = await zip.file('xl/_rels/workbook.xml.rels')!.async('string');
  const sst = await zip.file('xl/sharedStrings.xml')?.async('string');
  const strings = sst ? [...sst.matchAll(/<si>(.*?)<\/si>/gs)].map((m) => unescape([...m[1].matchAll(/<t[^>]*>(.*?)<\/t>/gs)].map((t) => t[1]).join(''))) : [];
  const sheets = new Map<string, Map<string, StoredCell>>();
  for (const m of workbook.matchAll(/<sheet [^>]*name="([^"]+)"[^>]*r:id="([^"]+)"/g)) {
    const target = new RegExp(`Id="${m[2]}"[^>]*Target="([^"]+)"|Target="([^"]+)"[^>]*Id="${m[2]}"`).exec(rels)!;
    const part = (target[1] ?? target[2]).replace(/^\/?(xl\/)?/, 'xl/');
    const xml = await zip.file(part)!.async('string');
    const cells = new Map<string, StoredCell>();
    for (const c of xml.matchAll(/<c r="([A-Z]+\d+)"([^>]*?)(?:\/>|>(.*?)<\/c>)/gs)) {
      const inner = c[3] ?? '';
      const raw = /<v>(.*?)<\/v>/s.exec(inner)?.[1];
      const shared = /\bt="s"/.test(c[2]);
      const f = /<f[^>]*>(.*?)<\/f>/s.exec(inner)?.[1];
      cells.set(c[1], { v: raw === undefined ? undefined : shared ? strings[Number(raw)] : unescape(raw), f: f === undefined ? undefined : unescape(f), s: /\bs="(\d+)"/.exec(c[2])?.[1] });
    }
    sheets.set(unescape(m[1]), cells);
  }
  return { workbook, sheets };
}

/** The cells of `a` whose stored value differs in `b`: [sheet!address, a's value, b's value, a's formula, b's formula]. */
export function storedDifferences(a: StoredWorkbook, b: StoredWorkbook): { at: string; a?: string; b?: string; fa?: string; fb?: string }[] {
  const out: { at: string; a?: string; b?: string; fa?: string; fb?: string }[] = [];
  for (const [sheet, cells] of a.sheets) {
    const other = b.sheets.get(sheet) ?? new Map<string, StoredCell>();
    for (const [at, c] of cells) {
      const d = other.get(at);
      if (d?.v !== c.v || d?.f !== c.f) out.push({ at: `${sheet}!${at}`, a: c.v, b: d?.v, fa: c.f, fb: d?.f });
    }
  }
  return out;
}
