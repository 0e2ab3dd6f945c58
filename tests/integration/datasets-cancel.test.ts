// Integration: an upload cancelled part-way stores nothing. The route sees the request's
// signal abort (as Next aborts request.signal when the uploader's connection closes, and the
// browser's Cancel aborts the request) — once while the file is still arriving, once while
// the version's chunks are being written inside the transaction — and the database holds no
// trace of either: no dataset row, no version, no chunk.
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { useTestDatabase } from '../support/database';

const session = vi.hoisted(() => ({ claims: null as null | { userId: number; sessionVersion: number } }));
vi.mock('@/lib/auth/session-source', () => ({ readSessionClaims: async () => session.claims }));

useTestDatabase();

const ORIGIN = 'http://127.0.0.1:3000';
let labId = 0;

async function count(table: string): Promise<number> {
  const { getPool } = await import('@/db/client');
  const [rows] = await getPool().query(`SELECT COUNT(*) AS n FROM ${table}`);
  return Number((rows as { n: number }[])[0].n);
}

/** Row i of an invented nitrate table: site, sample id, reading in mg/L. */
const line = (i: number) => `${i % 2 ? 'upstream' : 'downstream'},S${String(i).padStart(7, '0')},${((1500 + ((i * 7919) % 3000)) / 1000).toFixed(3)}\n`;

/** The NDJSON lines of an upload answer, as they arrive. */
async function* lines(res: Response): AsyncGenerator<{ type: string; phase?: string; error?: { code: string; message: string } }> {
  const reader = res.body!.getReader();
  const decoder = new TextDecoder();
  let buf = '';
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    buf += decoder.decode(value, { stream: true });
    let nl: number;
    while ((nl = buf.indexOf('\n')) >= 0) {
      const text = buf.slice(0, nl);
      buf = buf.slice(nl + 1);
      if (text.trim()) yield JSON.parse(text);
    }
  }
}

async function post(name: string, body: ReadableStream<Uint8Array>, signal: AbortSignal) {
  const { POST } = await import('@/app/api/labs/[labId]/datasets/route');
  const req = new Request(`${ORIGIN}/api/labs/${labId}/datasets?name=${encodeURIComponent(name)}`, {
    method: 'POST',
    headers: { host: '127.0.0.1:3000', 'content-type': 'text/csv', accept: 'application/x-ndjson' },
    body,
    signal,
    duplex: 'half',
  } as RequestInit);
  return POST(req, { params: Promise.resolve({ labId: String(labId) }) });
}

beforeAll(async () => {
  const { insertUser } = await import('@/db/queries/users');
  const { createLab } = await import('@/db/queries/labs');
  const author = await insertUser({ email: 'cancel@example.org', name: 'Cal Cancel', passwordHash: 'x' });
  labId = await createLab('Cancelling team', author);
  session.claims = { userId: author, sessionVersion: 0 };
});

describe('cancelling an upload', () => {
  it('stops while the file is still arriving and stores nothing', async () => {
    const before = { datasets: await count('datasets'), versions: await count('dataset_versions'), chunks: await count('dataset_chunks') };
    const encoder = new TextEncoder();
    let sent = 0;
    let stalled!: () => void;
    const reachedStall = new Promise<void>((r) => (stalled = r));
    // 20 chunks of rows, then the connection goes quiet (as a slow uploader's would).
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        if (sent === 20) {
          stalled();
          return new Promise(() => {});
        }
        let s = sent === 0 ? 'site,sample_id,nitrate_mg_l\n' : '';
        for (let i = 0; i < 2000; i++) s += line(sent * 2000 + i);
        controller.enqueue(encoder.encode(s));
        sent++;
      },
    });
    const abort = new AbortController();
    const res = await post('Cancelled while arriving', body, abort.signal);
    const seen = lines(res);
    await reachedStall;
    abort.abort();
    let last: { type: string; error?: { code: string; message: string } } | undefined;
    for await (const l of seen) last = l;
    expect(last?.type).toBe('error');
    expect(last?.error?.message).toMatch(/cancelled\. Nothing was stored/);
    expect({ datasets: await count('datasets'), versions: await count('dataset_versions'), chunks: await count('dataset_chunks') }).toEqual(before);
  });

  it('rolls back a version whose chunks were being written when the uploader went away', async () => {
    const before = { datasets: await count('datasets'), versions: await count('dataset_versions'), chunks: await count('dataset_chunks') };
    // 300,000 rows: 10 chunks per column, 30 in all, so the write takes a while.
    let s = 'site,sample_id,nitrate_mg_l\n';
    for (let i = 0; i < 300_000; i++) s += line(i);
    const body = new Blob([s]).stream();
    const abort = new AbortController();
    const res = await post('Cancelled while storing', body, abort.signal);
    const phases: string[] = [];
    let last: { type: string; error?: { code: string; message: string } } | undefined;
    for await (const l of lines(res)) {
      if (l.type === 'progress') phases.push(l.phase!);
      if (l.phase === 'storing' && !abort.signal.aborted) abort.abort();
      last = l;
    }
    expect(phases).toContain('storing');
    expect(last?.type).toBe('error');
    expect(last?.error?.message).toMatch(/cancelled/);
    expect({ datasets: await count('datasets'), versions: await count('dataset_versions'), chunks: await count('dataset_chunks') }).toEqual(before);
    // The name is free again: nothing of the cancelled dataset was left behind.
    const again = await post('Cancelled while storing', new Blob(['site,nitrate_mg_l\nup,2.1\n']).stream(), new AbortController().signal);
    const answers = [];
    for await (const l of lines(again)) answers.push(l);
    expect(answers.at(-1)?.type).toBe('done');
  });
});
