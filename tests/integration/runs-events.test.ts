// Integration (real MariaDB, real engine worker threads): a long run's progress streamed as
// server-sent events by GET /api/runs/:id/events — progress events that move forward, then
// the finished run with its result; a finished run answered at once; a cancelled run's stream
// ending with its cancelled state. The median is checked against simple-statistics.
import { median } from 'simple-statistics';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { useTestDatabase } from '../support/database';
import { closeComputePoolAfterAll, medianSettings, seedRunLab } from '../support/runs';

const session = vi.hoisted(() => ({ claims: null as null | { userId: number; sessionVersion: number } }));
vi.mock('@/lib/auth/session-source', () => ({ readSessionClaims: async () => session.claims }));

useTestDatabase();

type Svc = typeof import('@/lib/runs/service');
let svc: Svc;
let labId = 0;
let memoId = 0;
let datasetId = 0;
let userId = 0;
const values: number[] = [];

const settings = (B: number, seed: string) => medianSettings(datasetId, { B, seed, methods: ['percentile'] });

interface SseEvent {
  event: string;
  data: any;
}

/** Parses an event stream (WHATWG HTML § server-sent events: fields per line, blank line ends an event). */
async function* events(res: Response): AsyncGenerator<SseEvent> {
  const reader = res.body!.getReader();
  const decoder = new TextDecoder();
  let buf = '';
  for (;;) {
    const { done, value } = await reader.read();
    if (done) return;
    buf += decoder.decode(value, { stream: true });
    let end: number;
    while ((end = buf.indexOf('\n\n')) >= 0) {
      const block = buf.slice(0, end);
      buf = buf.slice(end + 2);
      let event = 'message';
      const data: string[] = [];
      for (const line of block.split('\n')) {
        if (line.startsWith('event: ')) event = line.slice(7);
        else if (line.startsWith('data: ')) data.push(line.slice(6));
      }
      if (data.length) yield { event, data: JSON.parse(data.join('\n')) };
    }
  }
}

async function open(runId: number) {
  const { GET } = await import('@/app/api/runs/[runId]/events/route');
  const res = await GET(new Request(`http://127.0.0.1:3000/api/runs/${runId}/events`), { params: Promise.resolve({ runId: String(runId) }) });
  expect(res.status).toBe(200);
  expect(res.headers.get('content-type')).toMatch(/^text\/event-stream/);
  return res;
}

beforeAll(async () => {
  // 20,000 invented nitrate readings (mg/L): with B = 20,000 a run draws 4·10⁸ indices, long
  // enough (about a second or more) for several progress events.
  for (let i = 0; i < 20_000; i++) values.push(Number((1.5 + ((i * 7919) % 3001) / 1000).toFixed(3)));
  ({ svc, userId, labId, datasetId, memoId } = await seedRunLab({
    user: { email: 'events@example.org', name: 'Eve Events' },
    lab: 'Events lab',
    dataset: { name: 'Many readings', columns: ['nitrate'], rows: values.map((v) => [v]) },
    memo: 'Events memo',
  }));
  session.claims = { userId, sessionVersion: 0 };
});

closeComputePoolAfterAll();

describe('run progress as server-sent events', () => {
  it('streams progress while a long run computes, then the current run with its result', async () => {
    const run = await svc.requestRun({ labId, memoId, blockId: 'long', type: 'estimate', settings: settings(20_000, 'sse'), userId, canCompute: true, waitMs: 0 });
    expect(['queued', 'running']).toContain(run.state);
    const seen: SseEvent[] = [];
    for await (const e of events(await open(run.id))) seen.push(e);
    const progress = seen.filter((e) => e.event === 'progress').map((e) => e.data.progress as number);
    expect(progress.length).toBeGreaterThanOrEqual(2);
    for (let k = 1; k < progress.length; k++) expect(progress[k]).toBeGreaterThanOrEqual(progress[k - 1]);
    expect(progress.every((p) => p >= 0 && p <= 1)).toBe(true);
    expect(progress.some((p) => p > 0 && p < 1)).toBe(true);
    const last = seen.at(-1)!;
    expect(last.event).toBe('run');
    expect(last.data).toMatchObject({ id: run.id, state: 'current', progress: 1 });
    expect(last.data.labId).toBeUndefined();
    expect(last.data.result.response.B).toBe(20_000);
    expect(last.data.result.response.estimate).toBeCloseTo(median(values), 12);
  });

  it('answers a finished run at once with one run event', async () => {
    const again = await svc.requestRun({ labId, memoId, blockId: 'again', type: 'estimate', settings: settings(20_000, 'sse'), userId, canCompute: true });
    expect(again.state).toBe('current');
    const seen: SseEvent[] = [];
    for await (const e of events(await open(again.id))) seen.push(e);
    expect(seen.map((e) => e.event)).toEqual(['run']);
    expect(seen[0].data.state).toBe('current');
  });

  it('ends a cancelled run’s stream with its cancelled state', async () => {
    const run = await svc.requestRun({ labId, memoId, blockId: 'cancel', type: 'estimate', settings: settings(40_000, 'sse-cancel'), userId, canCompute: true, waitMs: 0 });
    const stream = events(await open(run.id));
    const first = await stream.next();
    expect(first.value?.event).toBe('progress');
    await svc.cancelRun(run.id);
    let last: SseEvent | undefined;
    for await (const e of stream) last = e;
    expect(last?.event).toBe('run');
    expect(last?.data).toMatchObject({ id: run.id, state: 'failed', error: { code: 'cancelled:run' } });
  });

  it('refuses someone who is not a member of the run’s lab', async () => {
    const { insertUser } = await import('@/db/queries/users');
    const outsider = await insertUser({ email: 'outsider@example.org', name: 'Out Sider', passwordHash: 'x' });
    const run = await svc.requestRun({ labId, memoId, blockId: 'again', type: 'estimate', settings: settings(20_000, 'sse'), userId, canCompute: true });
    session.claims = { userId: outsider, sessionVersion: 0 };
    try {
      const { GET } = await import('@/app/api/runs/[runId]/events/route');
      const res = await GET(new Request(`http://127.0.0.1:3000/api/runs/${run.id}/events`), { params: Promise.resolve({ runId: String(run.id) }) });
      expect([403, 404]).toContain(res.status);
    } finally {
      session.claims = { userId, sessionVersion: 0 };
    }
  });
});
