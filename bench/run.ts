// Benchmark of issue 3: median of n = 10,000 values, B = 10,000 replicates, 95% percentile
// interval, timed as whole processes on the same machine in the same run:
//   Margin   `npm run -s compute -- FILE`           (worker threads on every core, typed arrays)
//   R        `Rscript bench/resampling/boot.R`       (boot::boot + boot.ci, r-cran-boot)
//   scipy    `/usr/bin/python3 bench/resampling/scipy_bench.py`  (scipy.stats.bootstrap, vectorised)
// and the floor: drawing the n·B indices alone. Prints medians of repeated runs, peak RSS
// (GNU time's maximum resident set size of the process tree) and the ratios, with targets
// R/Margin ≥ 10, scipy/Margin ≥ 5, Margin peak RSS < 300 MB. Results go to bench/results/.
// Every program runs without the sandbox's own settings (bench/support/timed.ts, benchEnv);
// Margin is also timed with the environment as it is, and both are printed.
//
//   npm run bench                 (RREPS=5 rounds; REPS=10 Margin runs in all, by default)
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import path from 'node:path';
import { createRng } from '@/lib/resampling';
import { measureFloor } from './resampling/floor';
import { benchEnv, median, peakRss, type Run, timed as timedIn } from './support/timed';

const root = process.cwd();
const n = Number(process.env.N ?? 10_000);
const B = Number(process.env.B ?? 10_000);
const reps = Number(process.env.REPS ?? 10);
const slowReps = Number(process.env.RREPS ?? 5);
const { env, removed } = benchEnv();
/** SciPy batch sizes tried before the rounds; the fastest is timed against Margin. */
const SCIPY_BATCHES = ['100', '250', '1000'];

// Invented data: n lognormal nitrate readings (mg/L), from the engine's own seeded generator.
const rng = createRng('bench', 'data');
const x = Array.from({ length: n }, () => {
  const u = rng.double();
  const v = rng.double();
  return Math.round(Math.exp(0.5 * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v) + 1) * 1e4) / 1e4;
});
const dir = path.join(tmpdir(), `margin-bench-${process.pid}`);
mkdirSync(dir, { recursive: true });
const requestFile = path.join(dir, 'request.json');
const dataFile = path.join(dir, 'x.txt');
writeFileSync(requestFile, JSON.stringify({ data: { x }, statistic: { name: 'median', column: 'x' }, B, seed: 'bench', intervals: { level: 0.95, methods: ['percentile'] } }));
writeFileSync(dataFile, `${x.join('\n')}\n`);

const timed = (cmd: string, args: string[], withEnv: NodeJS.ProcessEnv = env): Run => timedIn(cmd, args, { cwd: root, env: withEnv });

console.log(`Resampling benchmark: median, n = ${n}, B = ${B}, percentile interval; ${process.env.HOSTNAME ?? 'this machine'}, ${os()} cores`);
console.log('building the engine bundle (not timed) …');
execFileSync(process.execPath, [path.join(root, 'lib/compute/build-engine.mjs')], { cwd: root });

const rAvailable = spawnSync('Rscript', ['-e', 'library(boot)'], { encoding: 'utf8' }).status === 0;
const pyAvailable = spawnSync('/usr/bin/python3', ['-c', 'import scipy.stats'], { encoding: 'utf8' }).status === 0;
if (removed.length) console.log(`every program runs without ${removed.join(', ')} (bench/support/timed.ts); Margin also with them`);
// One untimed run of each program first, so none is timed with its files still out of the page cache.
console.log('warming the file cache (one untimed run of each program) …');
timed('npm', ['run', '-s', 'compute', '--', requestFile]);
if (rAvailable) timed('Rscript', [path.join(root, 'bench/resampling/boot.R'), dataFile, '100', '1']);
// SciPy's `batch` (resamples per vectorised call) changes its time by a third or more; its
// fastest value on this machine is chosen from one run of each candidate on the full case.
const scipy = (batch: string, b = String(B)) => timed('/usr/bin/python3', [path.join(root, 'bench/resampling/scipy_bench.py'), dataFile, b, '1', batch]);
let scipyBatchSize = '1000';
if (pyAvailable) {
  scipy('1000', '100');
  const sweep = SCIPY_BATCHES.map((batch) => ({ batch, seconds: scipy(batch).seconds }));
  scipyBatchSize = sweep.reduce((a, b) => (b.seconds < a.seconds ? b : a)).batch;
  console.log(`scipy batch sizes, one run each: ${sweep.map((x) => `${x.batch}: ${x.seconds.toFixed(2)} s`).join(', ')} → batch ${scipyBatchSize}`);
}

// Rounds interleave the programs, so that load from anything else on the machine falls on all
// of them alike; Margin runs `reps / slowReps` times per round.
const runs: Record<string, Run[]> = { margin: [], marginAsIs: [], r: [], scipyDefault: [], scipyBatch: [] };
const perRound = Math.max(1, Math.round(reps / slowReps));
/** Each round's runs by program: the ratios are taken within a round, where load was alike. */
const rounds: Record<string, number[]>[] = [];
for (let round = 0; round < slowReps; round++) {
  const inRound: Record<string, number[]> = {};
  rounds.push(inRound);
  const step = (key: string, label: string, f: () => Run) => {
    const x = f();
    runs[key].push(x);
    (inRound[key] ??= []).push(x.seconds);
    process.stdout.write(`  round ${round + 1}/${slowReps} ${label}: ${x.seconds.toFixed(3)} s${x.rssMB ? `, ${x.rssMB.toFixed(0)} MB` : ''}\n`);
  };
  for (let i = 0; i < perRound; i++) step('margin', 'margin', () => timed('npm', ['run', '-s', 'compute', '--', requestFile]));
  if (removed.length) step('marginAsIs', 'margin (environment as it is)', () => timed('npm', ['run', '-s', 'compute', '--', requestFile], process.env));
  if (rAvailable) step('r', 'R boot', () => timed('Rscript', [path.join(root, 'bench/resampling/boot.R'), dataFile, String(B), '1']));
  if (pyAvailable) {
    step('scipyDefault', 'scipy (batch default)', () => scipy('none'));
    step('scipyBatch', `scipy (batch ${scipyBatchSize})`, () => scipy(scipyBatchSize));
  }
}
const summary = (list: Run[]) => {
  if (!list.length) return null;
  return { seconds: median(list.map((r) => r.seconds)), rssMB: peakRss(list), runs: list.map((r) => r.seconds), out: list[0].out };
};
const margin = summary(runs.margin)!;
const marginAsIs = summary(runs.marginAsIs);
const marginOut = JSON.parse(margin.out);
const r = summary(runs.r);
const scipyDefault = summary(runs.scipyDefault);
const scipyBatch = summary(runs.scipyBatch);
const scipyBest = scipyDefault && scipyBatch ? (scipyBatch.seconds < scipyDefault.seconds ? scipyBatch : scipyDefault) : (scipyDefault ?? scipyBatch);

console.log('measuring the floor (index draws alone, one thread) …');
const floor = measureFloor(JSON.parse(readFileSync(requestFile, 'utf8')));

const fmt = (v: number | null | undefined, d = 2) => (v === null || v === undefined ? 'n/a' : v.toFixed(d));
const rows = [
  ['Margin (npm run -s compute)', margin.seconds, margin.rssMB, `${marginOut.intervals.percentile.lower.toFixed(4)} – ${marginOut.intervals.percentile.upper.toFixed(4)}`],
  ...(marginAsIs ? [['Margin, environment as it is', marginAsIs.seconds, marginAsIs.rssMB, `with ${removed.join(', ')}`] as const] : []),
  ['R boot (Rscript)', r?.seconds ?? null, r?.rssMB ?? null, r?.out ?? 'not available'],
  ['scipy bootstrap, batch default', scipyDefault?.seconds ?? null, scipyDefault?.rssMB ?? null, scipyDefault?.out ?? 'not available'],
  [`scipy bootstrap, batch ${scipyBatchSize}`, scipyBatch?.seconds ?? null, scipyBatch?.rssMB ?? null, scipyBatch?.out ?? 'not available'],
] as const;
console.log(`\nwhole process, median of runs (load average at the end: ${loadavg().map((v) => v.toFixed(1)).join(' ')}):`);
for (const [label, s, rss, out] of rows) console.log(`  ${label.padEnd(32)} ${fmt(s as number | null, 3).padStart(7)} s   peak RSS ${fmt(rss as number | null, 0).padStart(5)} MB   ${out}`);

// Ratios: the median over rounds of (reference ÷ Margin's median in the same round). The load
// on this machine drifts over a run of minutes; a ratio of two medians taken over different
// rounds can then say more about the drift than about the programs (both are printed).
const pairedRatio = (ref: string, mine: string): number | null => {
  const per = rounds.filter((x) => x[ref]?.length && x[mine]?.length).map((x) => median(x[ref]) / median(x[mine]));
  return per.length ? median(per) : null;
};
const scipyKey = scipyBest === scipyBatch ? 'scipyBatch' : 'scipyDefault';
const ratioR = pairedRatio('r', 'margin');
const ratioPy = scipyBest ? pairedRatio(scipyKey, 'margin') : null;
const ratioPyAsIs = scipyBest && marginAsIs ? pairedRatio(scipyKey, 'marginAsIs') : null;
const ratioOfMedians = { r: r ? r.seconds / margin.seconds : null, scipy: scipyBest ? scipyBest.seconds / margin.seconds : null };
const floorParallel = floor.floorMs / Math.min(2, os());
console.log('\nratios, median over rounds of reference ÷ Margin in the same round (target):');
console.log(`  R boot / Margin                 ${fmt(ratioR, 1)}×   (≥ 10×) ${ratioR === null ? '' : ratioR >= 10 ? 'met' : 'NOT met'}`);
console.log(`  scipy (faster setting) / Margin ${fmt(ratioPy, 1)}×   (≥ 5×) ${ratioPy === null ? '' : ratioPy >= 5 ? 'met' : 'NOT met'}`);
if (ratioPyAsIs !== null) console.log(`    … with Margin in the environment as it is: ${fmt(ratioPyAsIs, 1)}×`);
console.log(`  Margin peak RSS                 ${fmt(margin.rssMB, 0)} MB (< 300 MB) ${margin.rssMB === null ? '' : margin.rssMB < 300 ? 'met' : 'NOT met'}`);
console.log(`  (ratio of the medians above: R ${fmt(ratioOfMedians.r, 1)}×, scipy ${fmt(ratioOfMedians.scipy, 1)}×; per round, scipy ÷ Margin: ${rounds.map((x) => (x[scipyKey]?.length && x.margin?.length ? (median(x[scipyKey]) / median(x.margin)).toFixed(2) : '—')).join(', ')})`);
console.log('\nthe floor (one thread, in process):');
console.log(`  drawing ${floor.draws.toExponential(0)} indices alone      ${fmt(floor.floorMs, 0)} ms  (${fmt((floor.floorMs * 1e6) / floor.draws)} ns per index)`);
console.log(`  engine replicate loop (draws + median) ${fmt(floor.engineMs, 0)} ms = ${fmt(floor.engineMs / floor.floorMs)}× the floor`);
console.log(`  whole Margin process vs floor on ${Math.min(2, os())} cores (${fmt(floorParallel, 0)} ms): ${fmt((margin.seconds * 1000) / floorParallel)}×; process start, parsing and output make up the rest`);

mkdirSync(path.join(root, 'bench/results'), { recursive: true });
const result = { when: new Date().toISOString(), n, B, removedFromEnvironment: removed, scipyBatchSize, margin, marginAsIs, r, scipyDefault, scipyBatch, ratioR, ratioPy, ratioPyAsIs, ratioOfMedians, rounds, floor, loadAverage: loadavg() };
writeFileSync(path.join(root, 'bench/results/resampling.json'), `${JSON.stringify(result, null, 2)}\n`);
console.log(`\nwritten: bench/results/resampling.json`);

function os(): number {
  return availableParallelism();
}

// Structured-data cases (issue 4): block and cluster bootstraps vs R's tsboot / boot.
console.log('');
const { runStructuredBench } = await import('./structured');
runStructuredBench();
