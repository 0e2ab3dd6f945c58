import seedrandom from 'seedrandom';

/**
 * Invented demo data for the demo lab: a water-quality team samples nitrate (mg/L as N)
 * upstream and downstream of a treatment works, and keeps a daily series of the
 * downstream reading. Values are drawn from fixed-seed generators, so every install
 * gets the same tables. No real site or measurement is represented.
 */

function normal(rng: () => number): number {
  // Box–Muller transform (Box & Muller 1958).
  const u = 1 - rng();
  const v = rng();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
}

const round = (x: number, digits = 2) => Number(x.toFixed(digits));

export interface NitrateRow {
  site: 'upstream' | 'downstream';
  sample_id: string;
  visit: number;
  nitrate_mg_l: number;
  flow_m3_s: number;
}

/** 24 grab samples at each site over 12 visits (two per visit): skewed, lognormal-like. */
export function nitrateSamples(): NitrateRow[] {
  const rng = seedrandom('margin-demo-nitrate');
  const rows: NitrateRow[] = [];
  for (let visit = 1; visit <= 12; visit++) {
    const flow = round(Math.exp(1.1 + 0.35 * normal(rng)), 2);
    for (const site of ['upstream', 'downstream'] as const) {
      for (let k = 1; k <= 2; k++) {
        const mu = site === 'upstream' ? Math.log(2.1) : Math.log(2.9);
        const value = Math.exp(mu + 0.45 * normal(rng) - 0.08 * (flow - 3));
        rows.push({ site, sample_id: `${site === 'upstream' ? 'U' : 'D'}${String(visit).padStart(2, '0')}${k === 1 ? 'a' : 'b'}`, visit, nitrate_mg_l: round(value), flow_m3_s: flow });
      }
    }
  }
  return rows;
}

export interface DailyRow {
  date: string;
  nitrate_mg_l: number;
  rain_mm: number;
}

/** 120 days of downstream readings: an AR(1) series (φ = 0.6) around 2.8 mg/L. */
export function dailySeries(): DailyRow[] {
  const rng = seedrandom('margin-demo-daily');
  const rows: DailyRow[] = [];
  let e = 0;
  const start = Date.UTC(2026, 2, 1);
  for (let d = 0; d < 120; d++) {
    e = 0.6 * e + 0.35 * normal(rng);
    const rain = rng() < 0.3 ? round(-Math.log(1 - rng()) * 6, 1) : 0;
    rows.push({ date: new Date(start + d * 86_400_000).toISOString().slice(0, 10), nitrate_mg_l: round(2.8 + e + 0.02 * rain), rain_mm: rain });
  }
  return rows;
}

/** Renders rows as CSV text with a header row (the form a user would upload). */
export function toCsv<T extends object>(rows: T[]): string {
  if (rows.length === 0) return '';
  const keys = Object.keys(rows[0]) as (keyof T)[];
  return [keys.join(','), ...rows.map((r) => keys.map((k) => String(r[k])).join(','))].join('\n') + '\n';
}
