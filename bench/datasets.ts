// Benchmark: a 1,000,000-row × 5-column CSV (about 50 MB) read, summarised, hashed and stored
// as a dataset version through lib/datasets (the same code the upload route runs), on a
// throw-away database of the test MariaDB instance; then random pages read back as the table
// view does. Prints each measure with its target and the ratio measure / target (≤ 1 meets it).
//
//   node --import tsx bench/datasets.ts            (re-runs itself with --conditions=react-server)
//   ROWS=200000 node --import tsx bench/datasets.ts
//
// Targets (our own, for the product's "1,000,000 × 5 without freezing the page or the server"):
// the whole import within 30 s on one core; no event-loop stall over 100 ms while it runs (other
// requests keep being answered); peak memory growth under 1 GB; a page of 200 rows in 100 ms (p95).
import { spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { fileURLToPath } from 'node:url';

if (!process.execArgv.some((a) => a.includes('react-server'))) {
  const r = spawnSync(process.execPath, ['--conditions=react-server', '--import', 'tsx', fileURLToPath(import.meta.url)], { stdio: 'inherit', env: process.env });
  process.exit(r.status ?? 1);
}

const ROWS = Number(process.env.ROWS ?? 1_000_000);
const TARGET = { seconds: 30, stallMs: 100, memoryMb: 1024, pageMs: 100 };

function row(i: number): string {
  const day = new Date(Date.UTC(2026, 0, 1) + (i % 365) * 86_400_000).toISOString().slice(0, 10);
  const site = i % 2 ? 'upstream' : 'downstream';
  const nitrate = ((1500 + ((i * 7919) % 3000)) / 1000).toFixed(3);
  const flow = i % 97 === 0 ? 'NA' : ((200 + ((i * 104729) % 400)) / 100).toFixed(2);
  return `${day},${site},RIV-${site[0].toUpperCase()}-${String(i).padStart(7, '0')},${nitrate},${flow}\n`;
}

/** The file as 64 KB chunks, made up front so the measure is the import, not the generator. */
function file(): Uint8Array[] {
  const enc = new TextEncoder();
  const out: Uint8Array[] = [];
  let s = 'date,site,sample_id,nitrate_mg_l,flow_m3_s\n';
  for (let i = 0; i < ROWS; i++) {
    s += row(i);
    if (s.length >= 65_536) {
      out.push(enc.encode(s));
      s = '';
    }
  }
  if (s) out.push(enc.encode(s));
  return out;
}

const mysql = (await import('mysql2/promise')).default;
const { instance, start, urlFor } = await import('../scripts/lib/mariadb');
const db = instance('test');
await start(db, () => {});
const name = `margin_bench_${randomBytes(3).toString('hex')}`;
const root = await mysql.createConnection({ host: '127.0.0.1', port: db.port, user: db.user, password: db.password });
await root.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
process.env.DATABASE_URL = urlFor(db, name);

const line = (label: string, value: number, unit: string, target: number) =>
  console.log(`${label.padEnd(34)} ${value.toFixed(unit === 'ms' ? 0 : 1).padStart(8)} ${unit.padEnd(5)} target ≤ ${String(target).padEnd(5)} ratio ${(value / target).toFixed(2)}`);

try {
  const { runMigrations } = await import('../db/migrate');
  await runMigrations();
  const { insertUser } = await import('../db/queries/users');
  const { createLab } = await import('../db/queries/labs');
  const { importCsv, readRows, versionInfo } = await import('../lib/datasets');
  const userId = await insertUser({ email: 'bench@example.org', name: 'Bench', passwordHash: 'x' });
  const labId = await createLab('Bench lab', userId);

  const chunks = file();
  const size = chunks.reduce((a, c) => a + c.length, 0);
  global.gc?.();
  const rss0 = process.memoryUsage().rss;
  let peak = rss0;
  let stall = 0;
  let stallPhase = '';
  const stallBy: Record<string, number> = {};
  let phase = 'reading';
  let phaseStart = performance.now();
  let last = performance.now();
  const probe = setInterval(() => {
    const now = performance.now();
    const s = now - last - 10;
    if (s > stall) stallPhase = phase;
    stall = Math.max(stall, s);
    stallBy[phase] = Math.max(stallBy[phase] ?? 0, s);
    last = now;
    peak = Math.max(peak, process.memoryUsage().rss);
  }, 10);
  const phases: Record<string, number> = {};
  const t0 = performance.now();
  const result = await importCsv({
    labId,
    userId,
    name: 'Bench million',
    body: (async function* () {
      for (const c of chunks) yield c;
    })(),
    source: { kind: 'upload', fileName: 'bench.csv' },
    onProgress: (p) => {
      if (p.phase !== phase) {
        phases[phase] = (phases[phase] ?? 0) + performance.now() - phaseStart;
        phase = p.phase;
        phaseStart = performance.now();
      }
    },
  });
  phases[phase] = (phases[phase] ?? 0) + performance.now() - phaseStart;
  const seconds = (performance.now() - t0) / 1000;
  clearInterval(probe);

  const info = (await versionInfo(result.versionId))!;
  const times: number[] = [];
  for (let k = 0; k < 60; k++) {
    const offset = Math.floor(((k * 7_654_321) % ROWS) / 200) * 200;
    const a = performance.now();
    await readRows(info, offset, 200);
    times.push(performance.now() - a);
  }
  times.sort((a, b) => a - b);
  const p95 = times[Math.floor(0.95 * (times.length - 1))];

  console.log(`\ndatasets: ${ROWS.toLocaleString('en')} rows × 5 columns, ${(size / 1e6).toFixed(1)} MB of CSV, sha256 ${result.sha256.slice(0, 16)}…`);
  console.log(`phases: ${Object.entries(phases).map(([k, v]) => `${k} ${(v / 1000).toFixed(1)} s`).join(', ')}; ${(size / 1e6 / seconds).toFixed(1)} MB/s`);
  console.log(`longest stall by phase: ${Object.entries(stallBy).map(([k, v]) => `${k} ${Math.max(0, v).toFixed(0)} ms`).join(', ')}`);
  line('import (read+summarise+hash+store)', seconds, 's', TARGET.seconds);
  line(`longest event-loop stall (${stallPhase})`, stall, 'ms', TARGET.stallMs);
  line('peak memory growth', (peak - rss0) / 1e6, 'MB', TARGET.memoryMb);
  line('page of 200 rows, p95 of 60', p95, 'ms', TARGET.pageMs);
} finally {
  const { closeDb } = await import('../db/client');
  await closeDb();
  await root.query(`DROP DATABASE IF EXISTS \`${name}\``);
  await root.end();
}
