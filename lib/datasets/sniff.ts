import Papa from 'papaparse';
import { DELIMITERS, type Delimiter, type ReadOptions } from './options';
import { isMissing, parseDate, parseNumber } from './values';

export type Newline = '\n' | '\r\n' | '\r';

/** Bytes of the file's start that the guess looks at (and the browser preview shows). */
export const SNIFF_CHARS = 64 * 1024;

/** The sample without its last, probably cut-off line (unless the sample is the whole file). */
export function completeLines(sample: string, whole: boolean): string {
  if (whole) return sample;
  const cut = Math.max(sample.lastIndexOf('\n'), sample.lastIndexOf('\r'));
  return cut > 0 ? sample.slice(0, cut + 1) : sample;
}

/**
 * Guesses the delimiter, the header and the decimal mark from the first lines; any option
 * given wins over the guess.
 *  - delimiter: papaparse's guess (the candidate giving the most consistent field count over
 *    the first rows), among comma, semicolon, tab and vertical bar; comma when none fits;
 *  - header: the first row is a header when none of its fields is a number or a date while
 *    the rows below hold numbers or dates in some column, or when it holds neither (common
 *    practice: a data file whose first row is all text is nearly always named columns);
 *  - decimal: a comma when the delimiter is not a comma and the numbers look like 2,85
 *    with no 2.85 anywhere in the sample.
 */
export function guessOptions(sample: string, given: Partial<ReadOptions> = {}, whole = false): ReadOptions & { newline: Newline } {
  const text = completeLines(sample, whole);
  const probe = Papa.parse<string[]>(text, { preview: 30, delimitersToGuess: [...DELIMITERS], skipEmptyLines: true });
  const newline = (probe.meta.linebreak as Newline) || '\n';
  const delimiter: Delimiter = given.delimiter ?? ((DELIMITERS as readonly string[]).includes(probe.meta.delimiter) ? (probe.meta.delimiter as Delimiter) : ',');
  const rows = given.delimiter && given.delimiter !== probe.meta.delimiter ? Papa.parse<string[]>(text, { preview: 30, delimiter, newline, skipEmptyLines: true }).data : probe.data;

  let decimal: '.' | ',' = '.';
  if (given.decimal) decimal = given.decimal;
  else if (delimiter !== ',') {
    let comma = 0;
    let point = 0;
    for (const r of rows.slice(1)) for (const f of r) {
      const t = f.trim();
      if (/^[+-]?\d*,\d+$/.test(t)) comma++;
      else if (/^[+-]?\d*\.\d+$/.test(t)) point++;
    }
    if (comma > 0 && point === 0) decimal = ',';
  }

  let header = true;
  if (given.header !== undefined) header = given.header;
  else if (rows.length > 0) {
    const typed = (f: string) => {
      const t = f.trim();
      return !isMissing(t) && (parseNumber(t, decimal) !== null || parseDate(t) !== null);
    };
    header = !rows[0].some(typed);
  }
  return { delimiter, header, decimal, newline };
}
