import type { ColumnType } from '@/db/tables/datasets';
import { isMissing, parseDate, parseNumber } from './values';

/** A parsed column: numbers as doubles (NaN = missing), text and dates as strings (null = missing). */
export type ParsedColumn =
  | { name: string; type: 'number'; missing: number; values: Float64Array }
  | { name: string; type: 'text' | 'date'; missing: number; values: (string | null)[]; mostlyNumbers?: MostlyNumbers };

export interface MostlyNumbers {
  numbers: number;
  others: number;
  firstLine: number;
  example: string;
}

// Raw spellings kept for number cells whose text differs from the number's own rendering
// ("007", "2.50"), so that a column which turns out to be text keeps what the file said.
// Past this many, later spellings are rebuilt from the number.
const MAX_KEPT_SPELLINGS = 200_000;

/**
 * Whether String(Number(v)) might differ from v: a sign, a leading zero or point, a trailing
 * zero or point after a decimal point, an exponent, a decimal comma or many digits. A cheap
 * test on characters that spares the number-to-text conversion for most cells.
 */
function mayBeRespelled(v: string): boolean {
  const first = v.charCodeAt(0);
  if (first === 43 /* + */ || first === 46 /* . */) return true;
  if (first === 48 /* 0 */ && v.length > 1 && v.charCodeAt(1) !== 46) return true;
  if (first === 45 /* - */ && (v.charCodeAt(1) === 48 || v.charCodeAt(1) === 46)) return true;
  if (v.length > 15) return true;
  for (let i = 1; i < v.length; i++) {
    const c = v.charCodeAt(i);
    if (c === 101 || c === 69 || c === 44) return true; // e E ,
    if (c === 46) {
      const last = v.charCodeAt(v.length - 1);
      return last === 48 || last === 46;
    }
  }
  return false;
}

/**
 * Reads one column value by value, deciding its type as it goes: it starts as number (or
 * date) on the first non-missing value and falls back to text at the first value that does
 * not fit. Memory: 8 bytes a row while numeric; a string a row once text or date.
 */
export class ColumnBuilder {
  private type: ColumnType | 'unknown' = 'unknown';
  private leadingMissing = 0;
  private nums = new Float64Array(1024);
  private strs: (string | null)[] = [];
  private spellings = new Map<number, string>();
  private count = 0;
  missing = 0;
  /** For a column that was numeric before its first non-number: how many of each it holds. */
  private numbers = 0;
  private others = 0;
  private firstOther: { line: number; example: string } | null = null;

  constructor(
    readonly name: string,
    private readonly decimal: '.' | ',',
  ) {}

  push(raw: string, line: number): void {
    const v = raw.trim();
    const row = this.count++;
    if (isMissing(v)) {
      this.missing++;
      if (this.type === 'unknown') this.leadingMissing++;
      else if (this.type === 'number') this.setNum(row, NaN);
      else this.strs.push(null);
      return;
    }
    switch (this.type) {
      case 'number': {
        const x = parseNumber(v, this.decimal);
        if (x !== null) {
          this.setNum(row, x);
          this.numbers++;
          if (mayBeRespelled(v) && String(x) !== v && this.spellings.size < MAX_KEPT_SPELLINGS) this.spellings.set(row, v);
          return;
        }
        this.toText();
        this.noteOther(v, line);
        this.strs.push(v);
        return;
      }
      case 'date': {
        const d = parseDate(v);
        if (d !== null) this.strs.push(d);
        else {
          this.type = 'text';
          this.strs.push(v);
        }
        return;
      }
      case 'text':
        if (this.firstOther) {
          if (parseNumber(v, this.decimal) !== null) this.numbers++;
          else this.others++;
        }
        this.strs.push(v);
        return;
      case 'unknown': {
        this.strs = new Array(this.leadingMissing).fill(null);
        const x = parseNumber(v, this.decimal);
        if (x !== null) {
          this.type = 'number';
          this.strs = [];
          for (let k = 0; k < this.leadingMissing; k++) this.setNum(k, NaN);
          this.setNum(row, x);
          this.numbers++;
          if (mayBeRespelled(v) && String(x) !== v) this.spellings.set(row, v);
          return;
        }
        const d = parseDate(v);
        this.type = d !== null ? 'date' : 'text';
        this.strs.push(d ?? v);
      }
    }
  }

  private setNum(row: number, x: number) {
    if (row >= this.nums.length) {
      const bigger = new Float64Array(this.nums.length * 2);
      bigger.set(this.nums);
      this.nums = bigger;
    }
    this.nums[row] = x;
  }

  private noteOther(v: string, line: number) {
    this.others++;
    this.firstOther = { line, example: v.length > 40 ? `${v.slice(0, 40)}…` : v };
  }

  /** A numeric column met a non-number: rebuild the earlier cells as the text the file had. */
  private toText() {
    const n = this.count - 1;
    const strs: (string | null)[] = new Array(n);
    for (let k = 0; k < n; k++) {
      const x = this.nums[k];
      strs[k] = Number.isNaN(x) ? null : (this.spellings.get(k) ?? String(x));
    }
    this.strs = strs;
    this.nums = new Float64Array(0);
    this.spellings.clear();
    this.type = 'text';
  }

  finish(): ParsedColumn {
    if (this.type === 'number') return { name: this.name, type: 'number', missing: this.missing, values: this.nums.slice(0, this.count) };
    const values = this.type === 'unknown' ? new Array<string | null>(this.count).fill(null) : this.strs;
    const col: ParsedColumn = { name: this.name, type: this.type === 'date' ? 'date' : 'text', missing: this.missing, values };
    if (this.firstOther && this.numbers >= 4 * this.others) col.mostlyNumbers = { numbers: this.numbers, others: this.others, firstLine: this.firstOther.line, example: this.firstOther.example };
    return col;
  }
}
