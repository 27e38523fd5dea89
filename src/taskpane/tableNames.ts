/**
 * Names for the Excel tables the pane writes, made from what the table holds ("Window A hourly" →
 * `Window_A_hourly`) instead of Excel's "Table1". Excel's rules: letters, digits, underscores and
 * periods, starting with a letter or an underscore, at most 255 characters, not a cell reference
 * (`A1`, `R1C1`, `R`, `C`), and unique in the workbook without regard to case.
 */

/** Longest table name Excel accepts. */
export const TABLE_NAME_MAX = 255;

/** True when `name` looks like a cell reference (A1 or R1C1 style) or is R / C alone. */
function looksLikeReference(name: string): boolean {
  return /^[A-Za-z]{1,3}\d+$/.test(name) || /^[Rr](\d*)[Cc](\d*)$/.test(name) || /^[RrCc]$/.test(name);
}

/** True when Excel would accept `name` for a table (uniqueness aside). */
export function isValidTableName(name: string): boolean {
  return name.length > 0 && name.length <= TABLE_NAME_MAX && /^[A-Za-z_][A-Za-z0-9_.]*$/.test(name) && !looksLikeReference(name);
}

/**
 * A valid table name from any text: letters (accents dropped) and digits kept, everything else
 * one underscore; a name that would start with a digit or read as a cell reference gets `T_` in
 * front; nothing left gives `fallback`.
 */
export function cleanTableName(text: string, fallback = 'Sunpane'): string {
  let name = text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/[^A-Za-z0-9_.]+/g, '_')
    .replace(/_+/g, '_')
    .replace(/^[_.]+|[_.]+$/g, '');
  if (name === '') name = fallback;
  if (!/^[A-Za-z_]/.test(name) || looksLikeReference(name)) name = `T_${name}`;
  return name.slice(0, TABLE_NAME_MAX - 4);
}

/** `cleanTableName(text)`, or with `_2`, `_3`… after it when a table of the workbook has that name. */
export function uniqueTableName(text: string, existing: readonly string[]): string {
  const base = cleanTableName(text);
  const taken = new Set(existing.map((n) => n.toLowerCase()));
  if (!taken.has(base.toLowerCase())) return base;
  for (let k = 2; ; k++) {
    const name = `${base}_${k}`;
    if (!taken.has(name.toLowerCase())) return name;
  }
}

/** Names of every table in the workbook (load and sync inside the caller's batch). */
export async function tableNamesIn(ctx: Excel.RequestContext): Promise<string[]> {
  const tables = ctx.workbook.tables;
  tables.load('items/name');
  await ctx.sync();
  return tables.items.map((t) => t.name);
}
