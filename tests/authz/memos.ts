// Authorization rows: memos (list, create, read, autosave, rename/archive, duplicate), block
// runs, Data table rows and edits, SVG export, and run status / progress events / cancel.
import { ESTIMATE_DEFAULTS } from '@/blocks/estimate';
import { importCsv } from '@/lib/datasets';
import { createMemo } from '@/lib/memos';
import { getRunView, requestRun } from '@/lib/runs';
import { AUTHORS_UP, MEMBERS, type AuthzRow, type Fixture } from './_kit';

async function dataset(f: Fixture): Promise<{ datasetId: number; versionId: number }> {
  const r = await importCsv({
    labId: f.labId,
    userId: f.people.author.id,
    name: `Samples ${f.unique}`,
    body: (async function* () {
      yield new TextEncoder().encode('site,nitrate\nup,2.1\ndown,3.4\nup,2.6\ndown,3.9\nup,1.8\ndown,4.4\n');
    })(),
    source: { kind: 'seed' },
  });
  return { datasetId: r.datasetId, versionId: r.versionId };
}

const settings = (datasetId: number, seed = 'authz') => ({ ...ESTIMATE_DEFAULTS, dataset: { datasetId, versionId: null }, statistic: { name: 'mean', column: 'nitrate' }, B: 200, seed });

/** A memo with one Estimate block, optionally with its result computed (by the Author). */
async function memo(f: Fixture, opts: { computed?: boolean } = {}) {
  const ds = await dataset(f);
  const s = settings(ds.datasetId);
  const memoId = await createMemo(f.labId, f.people.author.id, `Memo ${f.unique}`, { type: 'doc', content: [{ type: 'estimate', attrs: { blockId: 'b1', ...s } }] });
  let runId = 0;
  if (opts.computed) {
    const r = await requestRun({ labId: f.labId, memoId, blockId: 'b1', type: 'estimate', settings: s, userId: f.people.author.id, canCompute: true, waitMs: 5000 });
    runId = r.id;
    for (let i = 0; i < 200 && (await getRunView(runId))!.state !== 'current'; i++) await new Promise((res) => setTimeout(res, 25));
  }
  return { memoId, runId, settings: s, ...ds };
}

const memoParams = (f: Fixture, memoId: number) => ({ labId: String(f.labId), memoId: String(memoId) });

export default [
  { method: 'GET', path: '/api/labs/[labId]/memos', request: (f) => ({ params: { labId: String(f.labId) }, query: { q: 'memo' } }), allowed: MEMBERS },
  { method: 'POST', path: '/api/labs/[labId]/memos', request: (f) => ({ params: { labId: String(f.labId) }, body: { title: 'New' } }), allowed: AUTHORS_UP },
  { method: 'GET', path: '/api/labs/[labId]/memos/[memoId]', request: async (f) => ({ params: memoParams(f, (await memo(f)).memoId) }), allowed: MEMBERS },
  {
    method: 'PUT',
    path: '/api/labs/[labId]/memos/[memoId]',
    name: 'autosave',
    request: async (f) => ({ params: memoParams(f, (await memo(f)).memoId), body: { revision: 1, doc: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'edited' }] }] } } }),
    allowed: AUTHORS_UP,
  },
  { method: 'PATCH', path: '/api/labs/[labId]/memos/[memoId]', request: async (f) => ({ params: memoParams(f, (await memo(f)).memoId), body: { title: 'Renamed', archived: true } }), allowed: AUTHORS_UP },
  { method: 'POST', path: '/api/labs/[labId]/memos/[memoId]/duplicate', request: async (f) => ({ params: memoParams(f, (await memo(f)).memoId), body: {} }), allowed: AUTHORS_UP },
  {
    method: 'POST',
    path: '/api/labs/[labId]/memos/[memoId]/runs',
    name: 'settings not computed yet (starts a computation)',
    request: async (f) => {
      const m = await memo(f);
      return { params: memoParams(f, m.memoId), body: { blockId: 'b1', type: 'estimate', settings: settings(m.datasetId, `fresh ${f.unique}`) } };
    },
    allowed: AUTHORS_UP,
  },
  {
    method: 'POST',
    path: '/api/labs/[labId]/memos/[memoId]/runs',
    name: 'cached result (reading only)',
    request: async (f) => {
      const m = await memo(f, { computed: true });
      return { params: memoParams(f, m.memoId), body: { blockId: 'b1', type: 'estimate', settings: m.settings } };
    },
    allowed: MEMBERS,
  },
  {
    method: 'GET',
    path: '/api/labs/[labId]/memos/[memoId]/table',
    request: async (f) => {
      const m = await memo(f);
      return { params: memoParams(f, m.memoId), query: { datasetId: String(m.datasetId) } };
    },
    allowed: MEMBERS,
  },
  {
    method: 'POST',
    path: '/api/labs/[labId]/memos/[memoId]/table',
    request: async (f) => {
      const m = await memo(f);
      return { params: memoParams(f, m.memoId), body: { datasetId: m.datasetId, baseVersionId: m.versionId, edits: [{ row: 0, column: 'nitrate', value: 2.2 }] } };
    },
    allowed: AUTHORS_UP,
  },
  {
    method: 'GET',
    path: '/api/labs/[labId]/memos/[memoId]/blocks/[blockId]/svg',
    request: async (f) => ({ params: { ...memoParams(f, (await memo(f, { computed: true })).memoId), blockId: 'b1' } }),
    allowed: MEMBERS,
  },
  { method: 'GET', path: '/api/runs/[runId]', request: async (f) => ({ params: { runId: String((await memo(f, { computed: true })).runId) } }), allowed: MEMBERS },
  { method: 'GET', path: '/api/runs/[runId]/events', request: async (f) => ({ params: { runId: String((await memo(f, { computed: true })).runId) } }), allowed: MEMBERS },
  { method: 'POST', path: '/api/runs/[runId]/cancel', request: async (f) => ({ params: { runId: String((await memo(f, { computed: true })).runId) }, body: {} }), allowed: AUTHORS_UP },
] satisfies AuthzRow[];
