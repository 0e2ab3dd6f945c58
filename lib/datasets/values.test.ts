import { describe, expect, it } from 'vitest';
import { isMissing, parseDate, parseNumber } from './values';

describe('reading one field', () => {
  it('reads plain decimal numbers, with a decimal comma when asked', () => {
    expect(parseNumber('2.85')).toBe(2.85);
    expect(parseNumber('-0.5e-3')).toBe(-0.0005);
    expect(parseNumber('.5')).toBe(0.5);
    expect(parseNumber('+7')).toBe(7);
    expect(parseNumber('2,85', ',')).toBe(2.85);
    expect(parseNumber('2,85')).toBeNull();
  });

  it('leaves ambiguous spellings as text rather than guessing a number', () => {
    // Number() would accept each of these; a dataset column should not.
    for (const s of ['0x1F', 'Infinity', '1_000', '1,234', '', ' ', '1e999', '<0.5', '3 mg']) expect(parseNumber(s)).toBeNull();
  });

  it('knows the usual missing-value tokens (common practice: R read.csv "NA", pandas read_csv defaults)', () => {
    for (const s of ['', 'NA', 'N/A', 'NaN', 'null', '#N/A']) expect(isMissing(s)).toBe(true);
    for (const s of ['0', 'na?', 'none', '-']) expect(isMissing(s)).toBe(false);
  });

  it('reads ISO 8601 dates and date-times, checking the calendar', () => {
    expect(parseDate('2026-03-01')).toBe('2026-03-01');
    expect(parseDate('2026-03-01 08:30')).toBe('2026-03-01T08:30');
    expect(parseDate('2026-03-01T08:30:15.250Z')).toBe('2026-03-01T08:30:15.250Z');
    expect(parseDate('2024-02-29')).toBe('2024-02-29'); // 2024 is a leap year
    expect(parseDate('2100-02-29')).toBeNull(); // 2100 is not (Gregorian century rule)
    expect(parseDate('2000-02-29')).toBe('2000-02-29'); // 2000 is (divisible by 400)
    expect(parseDate('2026-04-31')).toBeNull();
    expect(parseDate('2026-13-01')).toBeNull();
    expect(parseDate('2026-03-01T24:00')).toBeNull();
  });

  it('does not read day/month forms as dates, since their order differs by country', () => {
    expect(parseDate('03/04/2026')).toBeNull();
    expect(parseDate('1.3.2026')).toBeNull();
  });
});
