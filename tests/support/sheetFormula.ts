/**
 * A small evaluator of the worksheet formulas the pane writes over its hourly table, for the tests
 * that have no spreadsheet program at hand (the fake Excel host records formulas, it does not
 * calculate them). It reads the formula text as Excel does for the few things those formulas use —
 * numbers, text, parentheses, + − * / and comparisons element by element over arrays (TRUE = 1),
 * structured references `Table[[Header]]`, cell addresses, and MAX, SUMPRODUCT, IF, DATE, MONTH,
 * HOUR, DAY, INDEX, MATCH (exact) — and refuses anything else, so a formula it cannot read fails
 * the test rather than passing it. Dates are 1900-system serials (Excel's, from 1 March 1900 on).
 */

export type FormulaValue = number | string | (number | string)[];

/** What a formula refers to: a table column by header, a cell by address. */
export interface FormulaContext {
  column(table: string, header: string): ArrayLike<number | string>;
  cell?(address: string): FormulaValue;
}

const EPOCH = 25_569; // serial of 1970-01-01

function dateOf(serial: number): Date {
  return new Date(Math.round((serial - EPOCH) * 86_400_000 / 1000) * 1000);
}

function toArray(v: FormulaValue): (number | string)[] {
  return Array.isArray(v) ? v : [v];
}

function num(v: number | string): number {
  if (typeof v === 'number') return v;
  if (v === '') return 0;
  throw new Error(`formula: text "${v}" in arithmetic`);
}

function elementwise(a: FormulaValue, b: FormulaValue, f: (x: number | string, y: number | string) => number): FormulaValue {
  if (!Array.isArray(a) && !Array.isArray(b)) return f(a, b);
  const xs = toArray(a);
  const ys = toArray(b);
  const n = Math.max(xs.length, ys.length);
  if (xs.length !== 1 && ys.length !== 1 && xs.length !== ys.length) throw new Error('formula: arrays of different lengths');
  return Array.from({ length: n }, (_, i) => f(xs.length === 1 ? xs[0] : xs[i], ys.length === 1 ? ys[0] : ys[i]));
}

function map1(a: FormulaValue, f: (x: number) => number): FormulaValue {
  return Array.isArray(a) ? a.map((x) => f(num(x))) : f(num(a));
}

/** Evaluates `formula` (with or without its leading `=`). */
export function evaluateFormula(formula: string, ctx: FormulaContext): FormulaValue {
  const src = formula.replace(/^=/, '');
  let at = 0;
  const peek = () => src[at];
  const skip = () => {
    while (src[at] === ' ') at++;
  };
  const expect = (c: string) => {
    skip();
    if (src[at] !== c) throw new Error(`formula: expected "${c}" at ${at} in ${src}`);
    at++;
  };

  function comparison(): FormulaValue {
    const left = additive();
    skip();
    const op = /^(<=|>=|<>|=|<|>)/.exec(src.slice(at))?.[0];
    if (!op) return left;
    at += op.length;
    const right = additive();
    const cmp = (x: number | string, y: number | string): number => {
      const d = typeof x === 'number' && typeof y === 'number' ? x - y : String(x) < String(y) ? -1 : String(x) > String(y) ? 1 : 0;
      return Number({ '=': d === 0, '<>': d !== 0, '<': d < 0, '>': d > 0, '<=': d <= 0, '>=': d >= 0 }[op]);
    };
    return elementwise(left, right, cmp);
  }

  function additive(): FormulaValue {
    let v = term();
    for (;;) {
      skip();
      const c = peek();
      if (c !== '+' && c !== '-') return v;
      at++;
      const r = term();
      v = elementwise(v, r, (x, y) => (c === '+' ? num(x) + num(y) : num(x) - num(y)));
    }
  }

  function term(): FormulaValue {
    let v = unary();
    for (;;) {
      skip();
      const c = peek();
      if (c !== '*' && c !== '/') return v;
      at++;
      const r = unary();
      v = elementwise(v, r, (x, y) => (c === '*' ? num(x) * num(y) : num(x) / num(y)));
    }
  }

  function unary(): FormulaValue {
    skip();
    if (peek() === '-') {
      at++;
      return map1(unary(), (x) => -x);
    }
    return primary();
  }

  function args(): FormulaValue[] {
    expect('(');
    const out: FormulaValue[] = [];
    skip();
    if (peek() === ')') {
      at++;
      return out;
    }
    for (;;) {
      out.push(comparison());
      skip();
      if (peek() === ',') {
        at++;
        continue;
      }
      expect(')');
      return out;
    }
  }

  function call(name: string, a: FormulaValue[]): FormulaValue {
    const flat = (v: FormulaValue) => toArray(v).filter((x): x is number => typeof x === 'number');
    switch (name) {
      case 'MAX': {
        const xs = a.flatMap(flat);
        return xs.length === 0 ? 0 : xs.reduce((m, x) => (x > m ? x : m), -Infinity);
      }
      case 'SUMPRODUCT': {
        if (a.length !== 1) throw new Error('formula: SUMPRODUCT of more than one array is not read here');
        return flat(a[0]).reduce((s, x) => s + x, 0);
      }
      case 'IF':
        return num(toArray(a[0])[0]) !== 0 ? a[1] : (a[2] ?? 0);
      case 'DATE':
        return Date.UTC(num(a[0] as number), num(a[1] as number) - 1, num(a[2] as number)) / 86_400_000 + EPOCH;
      case 'MONTH':
        return map1(a[0], (s) => dateOf(s).getUTCMonth() + 1);
      case 'HOUR':
        return map1(a[0], (s) => dateOf(s).getUTCHours());
      case 'DAY':
        return map1(a[0], (s) => dateOf(s).getUTCDate());
      case 'INDEX':
        return toArray(a[0])[num(a[1] as number) - 1] as number;
      case 'MATCH': {
        if (num(a[2] as number) !== 0) throw new Error('formula: only MATCH(…, 0) is read here');
        const k = toArray(a[1]).findIndex((x) => x === a[0]);
        if (k < 0) throw new Error('formula: MATCH found nothing (#N/A)');
        return k + 1;
      }
      default:
        throw new Error(`formula: function ${name} is not read here`);
    }
  }

  function primary(): FormulaValue {
    skip();
    const rest = src.slice(at);
    const number = /^\d+(\.\d+)?(E[+-]?\d+)?/i.exec(rest);
    if (number) {
      at += number[0].length;
      return Number(number[0]);
    }
    if (peek() === '"') {
      const end = src.indexOf('"', at + 1);
      const text = src.slice(at + 1, end);
      at = end + 1;
      return text;
    }
    if (peek() === '(') {
      at++;
      const v = comparison();
      expect(')');
      return v;
    }
    const fn = /^([A-Z][A-Z0-9.]*)\(/.exec(rest);
    if (fn) {
      at += fn[1].length;
      return call(fn[1], args());
    }
    const table = /^([A-Za-z_][A-Za-z0-9_.]*)\[\[((?:[^\]']|'.)*)\]\]/.exec(rest);
    if (table) {
      at += table[0].length;
      const header = table[2].replace(/'(.)/g, '$1');
      // Blank cells stay blank: MAX skips them, arithmetic reads them as 0 (as Excel does).
      return Array.from(ctx.column(table[1], header));
    }
    const cell = /^\$?[A-Z]{1,3}\$?\d+/.exec(rest);
    if (cell && ctx.cell) {
      at += cell[0].length;
      return ctx.cell(cell[0].replace(/\$/g, ''));
    }
    throw new Error(`formula: cannot read "${rest.slice(0, 30)}" in ${src}`);
  }

  const v = comparison();
  skip();
  if (at !== src.length) throw new Error(`formula: unread text "${src.slice(at)}"`);
  return v;
}
