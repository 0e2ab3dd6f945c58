// Display helpers shared by the dataset pages (server and client).

const sig4 = new Intl.NumberFormat('en', { maximumSignificantDigits: 4 });
const whole = new Intl.NumberFormat('en');

/** A summary figure to four significant digits (1,234; 2.846; 0.0001235). */
export function figure(x: number | null | undefined): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  if (Math.abs(x) >= 1e15 || (x !== 0 && Math.abs(x) < 1e-6)) return x.toExponential(3);
  return sig4.format(x);
}

export function count(n: number): string {
  return whole.format(n);
}

export function bytes(n: number): string {
  if (n < 1024) return `${n} B`;
  if (n < 1024 * 1024) return `${(n / 1024).toFixed(1)} KB`;
  return `${(n / 1024 / 1024).toFixed(1)} MB`;
}

export const TYPE_LABEL = { number: 'number', text: 'text', date: 'date' } as const;

export function when(d: Date | string): string {
  const date = typeof d === 'string' ? new Date(d) : d;
  return date.toISOString().slice(0, 16).replace('T', ' ') + ' UTC';
}
