// Reporting convention: SE to two significant figures, estimate to the same decimal place
// (JCGM 100:2008, the GUM, §7.2.6 — common practice for reporting an uncertainty).
import { describe, expect, it } from 'vitest';
import { decimalsFor, formatLive, formatNumber } from './format';

describe('live value formatting', () => {
  it('gives the SE two significant figures', () => {
    expect(formatNumber(0.04372, 0.04372)).toBe('0.044');
    expect(formatNumber(12.34, 12.34)).toBe('12');
    expect(formatNumber(0.0009871, 0.0009871)).toBe('0.00099');
  });

  it('rounds the estimate to the decimal place of its SE', () => {
    expect(decimalsFor(0.137)).toBe(2);
    expect(formatNumber(2.94567, 0.137)).toBe('2.95');
    expect(formatNumber(1234.5678, 56)).toBe('1235');
    expect(formatNumber(-0.0004, 0.01)).toBe('0.000');
  });

  it('falls back to four significant figures without an SE', () => {
    expect(formatNumber(3.14159265)).toBe('3.142');
    expect(formatNumber(123456789)).toBe('1.235e+8');
    expect(formatNumber(Number.NaN)).toBe('—');
  });

  it('writes an interval as "lower to upper" at the SE precision', () => {
    expect(formatLive({ kind: 'interval', lower: 2.41234, upper: 3.5678, se: 0.29 })).toBe('2.41 to 3.57');
  });
});
