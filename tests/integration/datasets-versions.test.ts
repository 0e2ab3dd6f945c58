// Integration: datasets through the real route handlers on the real MariaDB test instance —
// numbered versions that are never overwritten, content hashes, and nothing stored from a
// bad file or a failure part-way.
import { createHash } from 'node:crypto';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { useTestDatabase } from '../support/database';

const session = vi.hoisted(() => ({ claims: null as null | { userId: number; sessionVersion: number } }));
vi.mock('@/lib/auth/session-source', () => ({ readSessionClaims: async () => session.claims }));

useTestDatabase();

const ORIGIN = 'http://127.0.0.1:3000';
let labId = 0;
let author = 0;
let reader = 0;

async function count(table: string, where = '1=1', values: unknown[] = []): Promise<number> {
  const { getPool } = await import('@/db/client');
  const [rows] = await getPool().query(`SELECT COUNT(*) AS n FROM ${table} WHERE ${where}`, values);
  return Number((rows as { n: number }[])[0].n);
}

function as(userId: number) {
  session.claims = { userId, sessionVersion: 0 };
}

async function createDataset(name: string, csv: string | BodyInit, query: Record<string, string> = {}, headers: Record<string, string> = {}) {
  const { POST } = await import('@/app/api/labs/[labId]/datasets/route');
  const qs = new URLSearchParams({ name, ...query });
  const req = new Request(`${ORIGIN}/api/labs/${labId}/datasets?${qs}`, { method: 'POST', headers: { host: '127.0.0.1:3000', 'content-type': 'text/csv', ...headers }, body: csv, duplex: 'half' } as RequestInit);
  return POST(req, { params: Promise.resolve({ labId: String(labId) }) });
}

async function addVersion(datasetId: number, body: string | object, query: Record<string, string> = {}) {
  const { POST } = await import('@/app/api/labs/[labId]/datasets/[datasetId]/versions/route');
  const json = typeof body !== 'string';
  const req = new Request(`${ORIGIN}/api/labs/${labId}/datasets/${datasetId}/versions?${new URLSearchParams(query)}`, {
    method: 'POST',
    headers: { host: '127.0.0.1:3000', 'content-type': json ? 'application/json' : 'text/csv' },
    body: json ? JSON.stringify(body) : body,
  });
  return POST(req, { params: Promise.resolve({ labId: String(labId), datasetId: String(datasetId) }) });
}

beforeAll(async () => {
  const { insertUser } = await import('@/db/queries/users');
  const { createLab, addMember } = await import('@/db/queries/labs');
  author = await insertUser({ email: 'author@example.org', name: 'Ada Author', passwordHash: 'x' });
  reader = await insertUser({ email: 'reader@example.org', name: 'Rey Reader', passwordHash: 'x' });
  labId = await createLab('Estuary team', author);
  await addMember(labId, reader, 'reader');
});

describe('dataset versions', () => {
  it('stores each upload as the next numbered version and keeps the earlier ones unchanged', async () => {
    as(author);
    const first = await createDataset('Grab samples', 'site,nitrate\nup,2.1\ndown,3.4\n', { fileName: 'grab.csv' });
    expect(first.status).toBe(201);
    const a = await first.json();
    expect(a.version).toMatchObject({ version: 1, rowCount: 2 });
    expect(a.options).toEqual({ delimiter: 'comma', header: true, decimal: 'point' });
    const datasetId = a.dataset.id;

    const second = await addVersion(datasetId, 'site;nitrate\nup;2,1\ndown;3,5\nmid;2,9\n');
    expect(second.status).toBe(201);
    const b = await second.json();
    expect(b.version).toMatchObject({ version: 2, rowCount: 3 });
    expect(b.options).toMatchObject({ delimiter: 'semicolon', decimal: 'comma' });

    const { loadDatasetVersion, latestVersion, listDatasets } = await import('@/lib/datasets');
    const v1 = await loadDatasetVersion(a.version.id);
    expect(v1).toMatchObject({ datasetId, labId, version: 1, name: 'Grab samples', rowCount: 2, superseded: true });
    expect(v1.data).toEqual({ site: ['up', 'down'], nitrate: [2.1, 3.4] });
    expect(v1.columns.map((c) => [c.name, c.type, c.missing])).toEqual([
      ['site', 'text', 0],
      ['nitrate', 'number', 0],
    ]);
    const v2 = await loadDatasetVersion(b.version.id);
    expect(v2.data.nitrate).toEqual([2.1, 3.5, 2.9]);
    expect((await latestVersion(datasetId))?.id).toBe(b.version.id);
    const list = await listDatasets(labId);
    expect(list.find((d) => d.id === datasetId)?.latest.version).toBe(2);
    expect(await count('dataset_versions', 'dataset_id = ?', [datasetId])).toBe(2);
  });

  it('hashes the canonical form: the same table in another layout has the same SHA-256, as computed here independently', async () => {
    as(author);
    const r1 = await (await createDataset('Hash check', 'site,v\nup,2.50\ndown,NA\n')).json();
    // The canonical text written out by hand from the rules in lib/datasets/hash.ts.
    const canonical = 'margin-table/1\n"site"\t"v"\ntext\tnumber\n"up"\t2.5\n"down"\t\n';
    expect(r1.version.sha256).toBe(createHash('sha256').update(canonical, 'utf8').digest('hex'));
    const r2 = await (await addVersion(r1.dataset.id, '"site"\t"v"\r\n"up"\t2.5\r\n"down"\t\r\n')).json();
    expect(r2.version.version).toBe(2);
    expect(r2.version.sha256).toBe(r1.version.sha256);
  });

  it('saves an edited table as a new version, read with the same rules (createVersionFromRows)', async () => {
    as(author);
    const r1 = await (await createDataset('Edited', 'site,v\nup,1\ndown,2\n')).json();
    const res = await addVersion(r1.dataset.id, { columns: ['site', 'v'], rows: [['up', 1], ['down', '2.5'], ['mid', null]] });
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body.version).toMatchObject({ version: 2, rowCount: 3 });
    const { loadDatasetVersion } = await import('@/lib/datasets');
    const v = await loadDatasetVersion(body.version.id);
    expect(v.data).toEqual({ site: ['up', 'down', 'mid'], v: [1, 2.5, null] });
    // The same table uploaded as CSV hashes the same.
    const csv = await (await addVersion(r1.dataset.id, 'site,v\nup,1\ndown,2.5\nmid,\n')).json();
    expect(csv.version.sha256).toBe(body.version.sha256);
  });

  it('gives two uploads at the same moment two different version numbers', async () => {
    as(author);
    const r1 = await (await createDataset('Concurrent', 'x\n1\n')).json();
    const [a, b, c] = await Promise.all([addVersion(r1.dataset.id, 'x\n2\n'), addVersion(r1.dataset.id, 'x\n3\n'), addVersion(r1.dataset.id, 'x\n4\n')]);
    const versions = (await Promise.all([a.json(), b.json(), c.json()])).map((r) => r.version.version).sort();
    expect(versions).toEqual([2, 3, 4]);
  });

  it('pages rows of a version through the rows route', async () => {
    as(author);
    let csv = 'i,sq\n';
    for (let i = 0; i < 70_000; i++) csv += `${i},${i * i}\n`;
    const r1 = await (await createDataset('Squares', csv)).json();
    as(reader);
    const { GET } = await import('@/app/api/labs/[labId]/datasets/[datasetId]/versions/[version]/rows/route');
    // Rows 32,760–32,780 straddle the first chunk boundary (32,768 rows a chunk).
    const res = await GET(new Request(`${ORIGIN}/api/labs/${labId}/datasets/${r1.dataset.id}/versions/1/rows?offset=32760&limit=20`), {
      params: Promise.resolve({ labId: String(labId), datasetId: String(r1.dataset.id), version: '1' }),
    });
    expect(res.status).toBe(200);
    const page = await res.json();
    expect(page.columns).toEqual(['i', 'sq']);
    expect(page.rows).toEqual(Array.from({ length: 20 }, (_, k) => [32760 + k, (32760 + k) ** 2]));
    const bad = await GET(new Request(`${ORIGIN}/x?limit=5000`), { params: Promise.resolve({ labId: String(labId), datasetId: String(r1.dataset.id), version: '1' }) });
    expect(bad.status).toBe(422);
    expect((await bad.json()).error.path).toBe('limit');
  });
});

describe('nothing half-stored', () => {
  it('refuses a ragged row deep in a new upload with its line number, and stores no dataset at all', async () => {
    as(author);
    let csv = 'site,nitrate\n';
    for (let i = 0; i < 40_000; i++) csv += i === 39_000 ? 'up,2.2,extra\n' : `up,${(2 + (i % 10) / 10).toFixed(1)}\n`;
    const before = [await count('datasets'), await count('dataset_versions'), await count('dataset_chunks')];
    const res = await createDataset('Ragged', csv);
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.error).toMatchObject({ code: 'invalid:dataset', path: 'line.39002' });
    expect(body.error.message).toMatch(/^Line 39002 has 3 fields, but line 1 has 2/);
    expect([await count('datasets'), await count('dataset_versions'), await count('dataset_chunks')]).toEqual(before);
  });

  it('refuses a bad new version and leaves the dataset at its last good version', async () => {
    as(author);
    const r1 = await (await createDataset('Stays at 1', 'x\n1\n')).json();
    for (const [file, expected] of [
      ['x\n1\n"open\n', /never closed/],
      ['x,y\na,b\n', /No column holds only numbers/],
      ['', /empty/],
      ['x\n', /no data rows/],
    ] as const) {
      const res = await addVersion(r1.dataset.id, file);
      expect(res.status).toBe(422);
      expect((await res.json()).error.message).toMatch(expected);
    }
    const latin1 = await addVersion(r1.dataset.id, 'x\n1\n');
    expect(latin1.status).toBe(201);
    expect(await count('dataset_versions', 'dataset_id = ?', [r1.dataset.id])).toBe(2);
  });

  it('refuses a binary or non-UTF-8 file streamed as bytes, naming the line', async () => {
    as(author);
    const latin1 = new Uint8Array([...new TextEncoder().encode('site,v\nup,1\nM'), 0xfc, ...new TextEncoder().encode('ller,2\n')]);
    const res = await createDataset('Latin-1', new Blob([latin1]));
    expect(res.status).toBe(422);
    expect((await res.json()).error.path).toBe('line.3');
    const zip = await createDataset('Workbook', new Blob([new Uint8Array([0x50, 0x4b, 0x03, 0x04, 1, 2, 3, 4])]));
    expect((await zip.json()).error.message).toMatch(/zip archive/);
    expect(await count('datasets', 'name IN (?, ?)', ['Latin-1', 'Workbook'])).toBe(0);
  });

  it('rolls the whole version back when the database fails part-way through the chunks', async () => {
    as(author);
    const r1 = await (await createDataset('Rollback', 'x\n1\n')).json();
    const { insertVersion } = await import('@/db/queries/datasets');
    const chunk = (k: number) => ({ columnIndex: 0, chunkIndex: k, encoding: 'f64' as const, payload: Buffer.from(new Float64Array([k]).buffer) });
    // The third chunk repeats the key of the first: MariaDB refuses it (duplicate primary key)
    // after two chunks and the version row are already written inside the transaction.
    await expect(insertVersion({ datasetId: r1.dataset.id }, { sha256: '0'.repeat(64), rowCount: 3, chunkRows: 1, columns: [], source: { kind: 'edit' } }, [chunk(0), chunk(1), chunk(0)], author)).rejects.toThrow(/Duplicate/);
    expect(await count('dataset_versions', 'dataset_id = ?', [r1.dataset.id])).toBe(1);
    expect(await count('dataset_chunks c JOIN dataset_versions v ON v.id = c.version_id', 'v.dataset_id = ?', [r1.dataset.id])).toBe(1);
    const { findDatasetById } = await import('@/db/queries/datasets');
    expect((await findDatasetById(r1.dataset.id))?.latestVersion).toBe(1);
    // And a new dataset whose first version fails leaves no dataset row either.
    await expect(insertVersion({ newDataset: { labId, name: 'Never' } }, { sha256: '0'.repeat(64), rowCount: 2, chunkRows: 1, columns: [], source: { kind: 'edit' } }, [chunk(0), chunk(0)], author)).rejects.toThrow();
    expect(await count('datasets', 'name = ?', ['Never'])).toBe(0);
  });

  it('refuses an upload cut short (fewer bytes than announced)', async () => {
    as(author);
    const res = await createDataset('Cut short', 'site,v\nup,1\n', {}, { 'content-length': '9999' });
    expect(res.status).toBe(400);
    expect((await res.json()).error.message).toMatch(/cut short: 12 of 9999 bytes/);
    expect(await count('datasets', 'name = ?', ['Cut short'])).toBe(0);
  });

  it('refuses a second dataset with the same name in the lab, before reading the file', async () => {
    as(author);
    await createDataset('Twice', 'x\n1\n');
    const res = await createDataset('Twice', 'x\n2\n');
    expect(res.status).toBe(409);
    expect((await res.json()).error.code).toBe('conflict:dataset');
  });

  it('lets a Reader read but not upload', async () => {
    as(reader);
    const res = await createDataset('By a reader', 'x\n1\n');
    expect(res.status).toBe(403);
    const { GET } = await import('@/app/api/labs/[labId]/datasets/route');
    const list = await GET(new Request(`${ORIGIN}/api/labs/${labId}/datasets`), { params: Promise.resolve({ labId: String(labId) }) });
    expect(list.status).toBe(200);
    expect((await list.json()).datasets.length).toBeGreaterThan(3);
  });
});
