// Authorization rows: the engine's JSON route. It reads no stored data (the request carries
// its own data), so any signed-in user may call it; anonymous callers are refused.
import { SIGNED_IN, type AuthzRow } from './_kit';

export default [
  {
    method: 'POST',
    path: '/api/compute',
    name: 'a small median request',
    request: () => ({ body: { data: { x: [2.1, 2.4, 1.9, 3.3, 2.8, 2.2, 2.6] }, statistic: { name: 'median', column: 'x' }, B: 200, seed: 'authz', intervals: { level: 0.9, methods: ['percentile'] } } }),
    allowed: SIGNED_IN,
  },
] satisfies AuthzRow[];
