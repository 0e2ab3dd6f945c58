// Benchmark of issue 4 (structured data): a block bootstrap and a cluster bootstrap,
// n = 10,000 rows, B = 10,000 replicates, 95% percentile interval, each timed as a whole
// process against R's boot package on the same machine in the same run, interleaved:
//   block     Margin moving-block (blockLength 20), mean of an AR(1) series (φ = 0.6)
//             vs `Rscript bench/structured/tsboot.R` — tsboot(x, mean, l = 20, sim = "fixed")
//   cluster   Margin cluster (500 sites × 20 readings), median and mean
//             vs `Rscript bench/structured/cluster.R` — boot() over site ids, rebuilding the
//             data from the drawn sites with unlist(split(...)[i])
// Every program runs without the sandbox's own settings (bench/support/timed.ts, benchEnv).
// Prints medians of runs, peak RSS (GNU time) and the ratios R / Margin, target ≥ 10×; and,
// for scale, the seconds inside the computation alone (Margin's runRequest on one thread,
// R's boot()/tsboot() + boot.ci() as timed by the R script) — process start-up excluded.
//   node --import tsx bench/structured.ts     (also run at the end of `npm run bench`)
//   REPS (Margin runs, default 5), RREPS (R runs, default 3)
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { createRng } from '@/lib/resampling';
import { benchEnv, median, peakRss, type Run, timed as timedIn } from './support/timed';

const root = process.cwd();
const n = 10_000;
const B = Number(process.env.B ?? 10_000);
const reps = Number(process.env.REPS ?? 5);
const slowReps = Number(process.env.RREPS ?? 3);
const { env } = benchEnv();
const timed = (cmd: string, args: string[]): Run => timedIn(cmd, args, { cwd: root, env });

export interface StructuredCase {
  name: string;
  /** seconds inside the computation only: Margin's runRequest on one thread, R's boot()/tsboot() + boot.ci() */
  inside: { margin: number; r: number | null; ratio: number | null };
  margin: { seconds: number; rssMB: number | null; runs: number[]; se: number };
  r: { seconds: number; rssMB: number | null; runs: number[]; out: string } | null;
  ratio: number | null;
}

/** Runs the structured cases and returns their timings (also printed). */
export function runStructuredBench(): StructuredCase[] {
  const dir = path.join(tmpdir(), `margin-bench-structured-${process.pid}`);
  mkdirSync(dir, { recursive: true });
  try {
    // Invented data from the engine's own seeded generator: a daily nitrate series with
    // AR(1) dependence (φ = 0.6), and readings at 500 sampling sites with a site effect.
    const rng = createRng('bench', 'structured');
    const normal = () => Math.sqrt(-2 * Math.log(1 - rng.double())) * Math.cos(2 * Math.PI * rng.double());
    const series: number[] = [];
    let level = 0;
    for (let t = -100; t < n; t++) {
      level = 0.6 * level + normal();
      if (t >= 0) series.push(Math.round((5 + 0.5 * level) * 1e4) / 1e4);
    }
    const site: string[] = [];
    const reading: number[] = [];
    for (let g = 0; g < 500; g++) {
      const effect = 0.8 * normal();
      for (let j = 0; j < 20; j++) {
        site.push(`site-${g + 1}`);
        reading.push(Math.round(Math.exp(1.5 + 0.3 * effect + 0.4 * normal()) * 1e4) / 1e4);
      }
    }
    const seriesFile = path.join(dir, 'series.txt');
    writeFileSync(seriesFile, `${series.join('\n')}\n`);
    const clusterFile = path.join(dir, 'sites.csv');
    writeFileSync(clusterFile, `site,reading\n${site.map((s, i) => `${s},${reading[i]}`).join('\n')}\n`);
    const req = (name: string, body: object) => {
      const file = path.join(dir, `${name}.json`);
      writeFileSync(file, JSON.stringify({ ...body, B, seed: 'bench', intervals: { level: 0.95, methods: ['percentile'] } }));
      return file;
    };
    const cases = [
      {
        name: 'moving-block, mean, n = 10,000, l = 20  vs  tsboot(sim = "fixed")',
        request: req('block', { data: { nitrate: series }, statistic: { name: 'mean', column: 'nitrate' }, scheme: { name: 'moving-block', blockLength: 20 } }),
        r: [path.join(root, 'bench/structured/tsboot.R'), seriesFile, String(B), '20', '1'],
      },
      {
        name: 'cluster, median, 500 sites × 20  vs  boot() over site ids',
        request: req('cluster-median', { data: { site, nitrate: reading }, statistic: { name: 'median', column: 'nitrate' }, scheme: { name: 'cluster', by: 'site' } }),
        r: [path.join(root, 'bench/structured/cluster.R'), clusterFile, String(B), 'median', '1'],
      },
      {
        name: 'cluster, mean, 500 sites × 20  vs  boot() over site ids',
        request: req('cluster-mean', { data: { site, nitrate: reading }, statistic: { name: 'mean', column: 'nitrate' }, scheme: { name: 'cluster', by: 'site' } }),
        r: [path.join(root, 'bench/structured/cluster.R'), clusterFile, String(B), 'mean', '1'],
      },
    ];

    console.log(`Structured-data benchmark: n = ${n}, B = ${B}, percentile interval`);
    execFileSync(process.execPath, [path.join(root, 'lib/compute/build-engine.mjs')], { cwd: root });
    const rAvailable = spawnSync('Rscript', ['-e', 'library(boot)'], { encoding: 'utf8' }).status === 0;
    const out: StructuredCase[] = [];
    for (const c of cases) {
      // one untimed run of each program first, so none is timed with its files out of the page cache
      timed('npm', ['run', '-s', 'compute', '--', c.request]);
      if (rAvailable) timed('Rscript', c.r.map((a, i) => (i === 2 ? '100' : a)));
      const m: Run[] = [];
      const r: Run[] = [];
      // interleave: one R run after every few Margin runs, so load falls on both alike
      for (let i = 0; i < Math.max(reps, slowReps); i++) {
        if (i < reps) m.push(timed('npm', ['run', '-s', 'compute', '--', c.request]));
        if (rAvailable && i < slowReps) r.push(timed('Rscript', c.r));
      }
      const se = JSON.parse(m[0].out).se as number;
      // inside the computation: Margin's runRequest on one thread, in a fresh process (bench/structured/inside.ts)
      const insideMargin = Number(execFileSync(process.execPath, ['--import', 'tsx', path.join(root, 'bench/structured/inside.ts'), c.request, '3'], { cwd: root, encoding: 'utf8' }).trim());
      const insideR = r.length ? median(r.map((x) => Number(/inside ([\d.]+)/.exec(x.out)?.[1] ?? Number.NaN))) : null;
      const margin = { seconds: median(m.map((x) => x.seconds)), rssMB: peakRss(m), runs: m.map((x) => x.seconds), se };
      const rr = r.length ? { seconds: median(r.map((x) => x.seconds)), rssMB: peakRss(r), runs: r.map((x) => x.seconds), out: r[0].out } : null;
      // R's run i against Margin's run i, taken one after the other: load on the machine drifts
      // over minutes, and the pairs see alike load (the median of the pair ratios).
      const pairs = Math.min(m.length, r.length);
      const ratio = pairs ? median(Array.from({ length: pairs }, (_, i) => r[i].seconds / m[i].seconds)) : null;
      const insideRatio = insideR !== null ? insideR / insideMargin : null;
      out.push({ name: c.name, inside: { margin: insideMargin, r: insideR, ratio: insideRatio }, margin, r: rr, ratio });
      const f = (v: number | null, d = 2) => (v === null ? 'n/a' : v.toFixed(d));
      console.log(`\n${c.name}`);
      console.log(`  Margin ${f(margin.seconds, 3)} s (runs ${margin.runs.map((s) => s.toFixed(2)).join(', ')}), peak RSS ${f(margin.rssMB, 0)} MB, se ${se.toPrecision(5)}`);
      console.log(`  R      ${f(rr?.seconds ?? null, 3)} s (runs ${rr?.runs.map((s) => s.toFixed(2)).join(', ') ?? '—'}), peak RSS ${f(rr?.rssMB ?? null, 0)} MB, ${rr?.out ?? 'R not available'}`);
      console.log(`  ratio R / Margin ${f(ratio, 1)}×  (target ≥ 10×) ${ratio === null ? '' : ratio >= 10 ? 'met' : 'NOT met'}`);
      console.log(`  inside the computation: Margin ${f(insideMargin, 3)} s on one thread, R ${f(insideR, 3)} s: ${f(insideRatio, 1)}×`);
    }
    mkdirSync(path.join(root, 'bench/results'), { recursive: true });
    writeFileSync(path.join(root, 'bench/results/structured.json'), `${JSON.stringify({ when: new Date().toISOString(), n, B, cases: out }, null, 2)}\n`);
    console.log('\nwritten: bench/results/structured.json');
    return out;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(root, 'bench/structured.ts')) runStructuredBench();
