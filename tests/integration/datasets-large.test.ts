// Integration: a 1,000,000-row × 5-column CSV (about 50 MB) streamed through the real upload
// route into the real MariaDB, checked cell for cell against values generated here. Time,
// memory and event-loop stalls are printed, not asserted (targets belong to bench/datasets.ts),
// except for a generous memory ceiling that a buffering implementation would break.
import { createHash } from 'node:crypto';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { useTestDatabase } from '../support/database';

const session = vi.hoisted(() => ({ claims: null as null | { userId: number; sessionVersion: number } }));
vi.mock('@/lib/auth/session-source', () => ({ readSessionClaims: async () => session.claims }));

useTestDatabase();

const ROWS = 1_000_000;
const SITES = ['upstream', 'downstream'];

/** Row i of the generated table, as the CSV fields. */
function row(i: number): [string, string, string, string, string] {
  const day = new Date(Date.UTC(2026, 0, 1) + (i % 365) * 86_400_000).toISOString().slice(0, 10);
  const site = SITES[i % 2];
  const id = `RIV-${site[0].toUpperCase()}-${String(i).padStart(7, '0')}`;
  const nitrate = ((1500 + ((i * 7919) % 3000)) / 1000).toFixed(3); // 1.500 … 4.499 mg/L
  const flow = i % 97 === 0 ? 'NA' : ((200 + ((i * 104729) % 400)) / 100).toFixed(2);
  return [day, site, id, nitrate, flow];
}

function csvStream(): ReadableStream<Uint8Array> {
  const encoder = new TextEncoder();
  let i = -1;
  return new ReadableStream({
    pull(controller) {
      let s = '';
      if (i < 0) {
        s = 'date,site,sample_id,nitrate_mg_l,flow_m3_s\n';
        i = 0;
      }
      while (s.length < 64 * 1024 && i < ROWS) s += `${row(i++).join(',')}\n`;
      if (s) controller.enqueue(encoder.encode(s));
      if (i >= ROWS) controller.close();
    },
  });
}

let labId = 0;
let userId = 0;

beforeAll(async () => {
  const { insertUser } = await import('@/db/queries/users');
  const { createLab } = await import('@/db/queries/labs');
  userId = await insertUser({ email: 'big@example.org', name: 'Big Upload', passwordHash: 'x' });
  labId = await createLab('Large data', userId);
  session.claims = { userId, sessionVersion: 0 };
});

describe('a 1,000,000 × 5 upload', () => {
  it('streams through the upload route, stores every cell and hashes them as computed independently here', async () => {
    const { POST } = await import('@/app/api/labs/[labId]/datasets/route');
    let peakRss = process.memoryUsage().rss;
    const baseRss = peakRss;
    let maxLag = 0;
    let last = performance.now();
    const probe = setInterval(() => {
      const now = performance.now();
      maxLag = Math.max(maxLag, now - last - 10);
      last = now;
      peakRss = Math.max(peakRss, process.memoryUsage().rss);
    }, 10);
    const t0 = performance.now();
    const req = new Request(`http://127.0.0.1:3000/api/labs/${labId}/datasets?name=Million`, { method: 'POST', headers: { 'content-type': 'text/csv' }, body: csvStream(), duplex: 'half' } as RequestInit);
    const res = await POST(req, { params: Promise.resolve({ labId: String(labId) }) });
    const seconds = (performance.now() - t0) / 1000;
    clearInterval(probe);
    const body = await res.json();
    expect(res.status, JSON.stringify(body)).toBe(201);
    console.log(`[datasets-large] 1,000,000 × 5 stored in ${seconds.toFixed(1)} s; RSS +${((peakRss - baseRss) / 1e6).toFixed(0)} MB at peak; longest event-loop stall ${maxLag.toFixed(0)} ms; ${(body.version.bytes / 1e6).toFixed(1)} MB of CSV`);
    expect(body.version.rowCount).toBe(ROWS);
    expect(body.version.columns.map((c: { type: string }) => c.type)).toEqual(['date', 'text', 'text', 'number', 'number']);
    expect(body.version.columns[4].missing).toBe(Math.floor((ROWS - 1) / 97) + 1);
    // A buffering reader would hold the file, its rows as objects and the SQL; streaming stays far below this.
    expect(peakRss - baseRss).toBeLessThan(1_500_000_000);

    // The canonical form (lib/datasets/hash.ts) recomputed from the generator, not from what was parsed.
    const h = createHash('sha256');
    h.update('margin-table/1\n"date"\t"site"\t"sample_id"\t"nitrate_mg_l"\t"flow_m3_s"\ndate\ttext\ttext\tnumber\tnumber\n');
    let text = '';
    for (let i = 0; i < ROWS; i++) {
      const [d, s, id, n, f] = row(i);
      text += `"${d}"\t"${s}"\t"${id}"\t${String(Number(n))}\t${f === 'NA' ? '' : String(Number(f))}\n`;
      if (text.length > 1 << 20) {
        h.update(text);
        text = '';
      }
    }
    h.update(text);
    expect(body.version.sha256).toBe(h.digest('hex'));

    const { readRows, versionInfo } = await import('@/lib/datasets');
    const info = (await versionInfo(body.version.id))!;
    const tail = await readRows(info, ROWS - 3, 10);
    expect(tail).toEqual([ROWS - 3, ROWS - 2, ROWS - 1].map((i) => row(i).map((v, j) => (j >= 3 ? (v === 'NA' ? null : Number(v)) : v))));
    const { getPool } = await import('@/db/client');
    const [chunks] = await getPool().query('SELECT COUNT(*) AS n, SUM(LENGTH(payload)) AS bytes FROM dataset_chunks WHERE version_id = ?', [body.version.id]);
    const c = (chunks as { n: number; bytes: string }[])[0];
    console.log(`[datasets-large] stored as ${c.n} chunks, ${(Number(c.bytes) / 1e6).toFixed(1)} MB`);
    expect(Number(c.n)).toBe(5 * Math.ceil(ROWS / 32_768));
  }, 300_000);
});
