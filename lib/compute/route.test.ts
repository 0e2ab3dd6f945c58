// POST /api/compute: authenticate → validate → compute (lib/compute) → JSON; errors as
// { error: { code, message, path } } with 400 / 401 / 422. The session is replaced by a stub.
import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { runRequest } from '@/lib/resampling';

const session = vi.hoisted(() => ({ user: null as null | { id: number; email: string; name: string } }));
vi.mock('@/lib/auth/session', async () => {
  const { AppError } = await import('@/lib/errors');
  return {
    requireUser: async () => {
      if (!session.user) throw new AppError('unauthorized:session', 'Please sign in.');
      return session.user;
    },
    currentUser: async () => session.user,
  };
});

const { POST } = await import('@/app/api/compute/route');
const { closeComputePool } = await import('./index');
afterAll(() => closeComputePool());

const post = (body: string) => POST(new Request('http://127.0.0.1/api/compute', { method: 'POST', body, headers: { 'content-type': 'application/json' } }), undefined as never);
const request = { data: { nitrate: [3.1, 4.4, 2.9, 5.2, 3.8, 4.1, 6.0, 3.3, 4.7, 3.9, 5.5, 2.7] }, statistic: { name: 'median', column: 'nitrate' }, B: 999, seed: 'route', intervals: { methods: ['percentile', 'bca'] } };

describe('POST /api/compute', () => {
  beforeEach(() => {
    session.user = { id: 1, email: 'ana@example.test', name: 'Ana' };
  });

  it('answers the engine response, identical to the module', async () => {
    const res = await post(JSON.stringify(request));
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual(JSON.parse(JSON.stringify(runRequest(request))));
  });

  it('401 without a session', async () => {
    session.user = null;
    const res = await post(JSON.stringify(request));
    expect(res.status).toBe(401);
    expect((await res.json()).error.code).toBe('unauthorized:session');
  });

  it('400 for malformed JSON', async () => {
    const res = await post('{"data": [');
    expect(res.status).toBe(400);
    expect((await res.json()).error).toMatchObject({ code: 'bad_request:json', path: '' });
  });

  it('422 naming the field for an invalid request or one over a limit', async () => {
    const bad = await post(JSON.stringify({ ...request, statistic: { name: 'median', column: 'flow' } }));
    expect(bad.status).toBe(422);
    expect((await bad.json()).error).toMatchObject({ code: 'invalid:request', path: 'statistic.column' });
    const text = await post(JSON.stringify({ ...request, data: { nitrate: [1, 'high', 3] } }));
    expect((await text.json()).error.path).toBe('data.nitrate[1]');
    const big = await post(JSON.stringify({ ...request, B: 5_000_000 }));
    expect(big.status).toBe(422);
    expect((await big.json()).error).toMatchObject({ code: 'limit:B', path: 'B' });
    const noColumn = await post(JSON.stringify({ ...request, scheme: { name: 'cluster', by: 'site' } }));
    expect((await noColumn.json()).error).toMatchObject({ code: 'invalid:request', path: 'scheme.by' });
  });
});
