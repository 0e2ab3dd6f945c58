import type { LiveNumber } from '../shared/types';

/**
 * Formats a result for reading. Convention (common practice in reporting, e.g. the
 * "two significant figures for the uncertainty" rule in the GUM, JCGM 100:2008 §7.2.6):
 * the standard error is given to 2 significant figures, and the estimate and interval end
 * points to the same decimal place as that SE, so no digit is shown that the Monte Carlo
 * and sampling error make meaningless. Without an SE, 4 significant figures.
 */
export function decimalsFor(se: number | null | undefined): number | null {
  if (se === null || se === undefined || !Number.isFinite(se) || se <= 0) return null;
  // Place of the second significant figure of se, e.g. se = 0.0437 → 3 decimals (0.044).
  const d = 1 - Math.floor(Math.log10(se));
  return Math.max(0, Math.min(d, 12));
}

export function formatNumber(value: number, se?: number | null): string {
  if (!Number.isFinite(value)) return '—';
  const d = decimalsFor(se);
  if (d !== null) return trimNegativeZero(value.toFixed(d));
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e6 || abs < 1e-4) return value.toExponential(3);
  return trimNegativeZero(Number(value.toPrecision(4)).toString());
}

function trimNegativeZero(s: string): string {
  return /^-0(\.0*)?$/.test(s) ? s.slice(1) : s;
}

export function formatLive(n: LiveNumber): string {
  if (n.kind === 'number') return formatNumber(n.value, n.se);
  return `${formatNumber(n.lower, n.se)} to ${formatNumber(n.upper, n.se)}`;
}
