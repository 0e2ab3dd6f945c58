/**
 * How one CSV field is read: missing, a number, an ISO 8601 date, or text. Pure, shared by
 * the server parser and the browser preview, so both classify a field the same way.
 */

/**
 * Tokens read as a missing value (after trimming). Common practice, from memory: R's
 * read.csv treats "NA" as missing by default, and pandas' read_csv adds "", "N/A", "n/a",
 * "NaN", "nan", "null", "NULL", "None" and "#N/A" to that list.
 */
export const MISSING_TOKENS: ReadonlySet<string> = new Set(['', 'NA', 'N/A', 'n/a', 'NaN', 'nan', 'null', 'NULL', 'None', '#N/A']);

export function isMissing(trimmed: string): boolean {
  return MISSING_TOKENS.has(trimmed);
}

// A plain decimal number: optional sign, digits with an optional fraction (or a bare
// fraction), optional exponent. No thousands separators, hex, "Infinity" or underscores —
// those stay text, so a column is numeric only when every value is unambiguous.
const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const NUMBER_COMMA = /^[+-]?(?:\d+,?\d*|,\d+)(?:[eE][+-]?\d+)?$/;

/** The number a trimmed field holds, or null when it is not a plain decimal number. */
export function parseNumber(trimmed: string, decimal: '.' | ',' = '.'): number | null {
  if (decimal === ',') {
    if (!NUMBER_COMMA.test(trimmed)) return null;
    trimmed = trimmed.replace(',', '.');
  } else if (!NUMBER.test(trimmed)) return null;
  const x = Number(trimmed);
  return Number.isFinite(x) ? x : null;
}

// ISO 8601 calendar date, optionally with a time of day and a zone: 2026-03-01,
// 2026-03-01T08:30, 2026-03-01 08:30:15.250Z, 2026-03-01T08:30+01:00.
const DATE = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.\d{1,9})?)?(?:Z|[+-]\d{2}:?\d{2})?)?$/;

function daysIn(year: number, month: number): number {
  // Gregorian leap years: divisible by 4, except centuries not divisible by 400.
  if (month === 2) return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 29 : 28;
  return [4, 6, 9, 11].includes(month) ? 30 : 31;
}

/**
 * The field as a normalised ISO 8601 string (a space before the time becomes "T"), or null
 * when it is not a valid calendar date. Only ISO forms are read as dates: 03/04/2026 means
 * different days in different countries, so such fields stay text.
 */
export function parseDate(trimmed: string): string | null {
  const m = DATE.exec(trimmed);
  if (!m) return null;
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  if (month < 1 || month > 12 || day < 1 || day > daysIn(year, month)) return null;
  if (m[4] !== undefined && (Number(m[4]) > 23 || Number(m[5]) > 59 || (m[6] !== undefined && Number(m[6]) > 59))) return null;
  return trimmed.length > 10 && trimmed[10] === ' ' ? `${trimmed.slice(0, 10)}T${trimmed.slice(11)}` : trimmed;
}
