/**
 * Numbers written as text in a user's file or cell, with a decimal point or a decimal comma. A file
 * uses one mark throughout: the mark is stated by the user or found from the file, and a file that
 * mixes them, or whose commas could as well be thousands separators, is refused with the reason
 * rather than read wrongly. Never a silent zero: text that is not a number stays "not a number".
 */

/** The character between the whole and the decimal part of a number. */
export type DecimalMark = 'point' | 'comma';

const WITH_POINT = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
const WITH_COMMA = /^[+-]?(?:\d+(?:,\d*)?|,\d+)(?:[eE][+-]?\d+)?$/;
/** A comma that could as well separate thousands: 1–3 digits, a comma, exactly three digits. */
const THOUSANDS_LIKE = /^[+-]?\d{1,3},\d{3}$/;

/**
 * A number from its text with the given decimal mark; undefined when the text is not a number
 * (blank, letters, a thousands separator, the other decimal mark, `Infinity`…).
 */
export function readNumberText(text: string, mark: DecimalMark): number | undefined {
  const t = text.trim();
  if (mark === 'point') return WITH_POINT.test(t) ? Number(t) : undefined;
  return WITH_COMMA.test(t) ? Number(t.replace(',', '.')) : undefined;
}

/** A text and where it is, for messages. */
export interface PlacedText {
  text: string;
  where: string;
}

/** What the texts of a file say about its decimal mark. */
export interface DecimalMarkFinding {
  /** The mark to read with: the only one used, else the point. */
  mark: DecimalMark;
  /** The first text with a decimal point and the first with a decimal comma, when both occur. */
  mixed?: { point: PlacedText; comma: PlacedText };
  /** The first comma text, when every text with a comma could be a thousands group (`1,250`). */
  ambiguous?: PlacedText;
}

/**
 * Finds the decimal mark of a file from its number texts (texts without a mark — whole numbers,
 * blanks, words — say nothing).
 */
export function findDecimalMark(texts: Iterable<PlacedText>): DecimalMarkFinding {
  let point: PlacedText | undefined;
  let comma: PlacedText | undefined;
  let allThousandsLike = true;
  for (const p of texts) {
    const t = p.text.trim();
    if (t.includes('.') && WITH_POINT.test(t)) point ??= p;
    else if (t.includes(',') && WITH_COMMA.test(t)) {
      comma ??= p;
      if (!THOUSANDS_LIKE.test(t)) allThousandsLike = false;
    }
  }
  if (point && comma) return { mark: 'point', mixed: { point, comma } };
  if (comma) return allThousandsLike ? { mark: 'point', ambiguous: comma } : { mark: 'comma' };
  return { mark: 'point' };
}
