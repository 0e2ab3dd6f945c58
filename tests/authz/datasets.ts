// Authorization rows: datasets (list, create, versions, rows, rename).
import { importCsv } from '@/lib/datasets';
import { AUTHORS_UP, MEMBERS, NOBODY, type AuthzRow, type Fixture } from './_kit';

/** A dataset with one version in the given lab (the fixture lab unless told otherwise). */
async function dataset(f: Fixture, labId = f.labId): Promise<number> {
  const owner = labId === f.labId ? f.people.author.id : f.people.outsider.id;
  const r = await importCsv({
    labId,
    userId: owner,
    name: `Samples ${f.unique}`,
    body: (async function* () {
      yield new TextEncoder().encode('site,nitrate\nup,2.1\ndown,3.4\n');
    })(),
    source: { kind: 'seed' },
  });
  return r.datasetId;
}

const inLab = async (f: Fixture, extra: Record<string, string> = {}) => ({ labId: String(f.labId), datasetId: String(await dataset(f)), ...extra });

export default [
  { method: 'GET', path: '/api/labs/[labId]/datasets', request: (f) => ({ params: { labId: String(f.labId) } }), allowed: MEMBERS },
  {
    method: 'POST',
    path: '/api/labs/[labId]/datasets',
    name: 'paste a small table',
    request: (f) => ({ params: { labId: String(f.labId) }, body: { name: `Pasted ${f.unique}`, csv: 'site,nitrate\nup,2.1\ndown,3.4\n' } }),
    allowed: AUTHORS_UP,
  },
  { method: 'GET', path: '/api/labs/[labId]/datasets/[datasetId]', request: async (f) => ({ params: await inLab(f) }), allowed: MEMBERS },
  {
    method: 'GET',
    path: '/api/labs/[labId]/datasets/[datasetId]',
    name: "another lab's dataset asked for through this lab",
    request: async (f) => ({ params: { labId: String(f.labId), datasetId: String(await dataset(f, f.otherLabId)) } }),
    allowed: NOBODY,
  },
  { method: 'PATCH', path: '/api/labs/[labId]/datasets/[datasetId]', request: async (f) => ({ params: await inLab(f), body: { name: `Renamed ${f.unique}` } }), allowed: AUTHORS_UP },
  {
    method: 'POST',
    path: '/api/labs/[labId]/datasets/[datasetId]/versions',
    name: 'paste a new version',
    request: async (f) => ({ params: await inLab(f), body: { csv: 'site,nitrate\nup,2.2\ndown,3.1\n' } }),
    allowed: AUTHORS_UP,
  },
  {
    method: 'POST',
    path: '/api/labs/[labId]/datasets/[datasetId]/versions',
    name: 'save an edited table',
    request: async (f) => ({ params: await inLab(f), body: { columns: ['site', 'nitrate'], rows: [['up', 2.3], ['down', 3.0]] } }),
    allowed: AUTHORS_UP,
  },
  { method: 'GET', path: '/api/labs/[labId]/datasets/[datasetId]/versions/[version]', request: async (f) => ({ params: await inLab(f, { version: '1' }) }), allowed: MEMBERS },
  {
    method: 'GET',
    path: '/api/labs/[labId]/datasets/[datasetId]/versions/[version]/rows',
    request: async (f) => ({ params: await inLab(f, { version: '1' }), query: { offset: '0', limit: '10' } }),
    allowed: MEMBERS,
  },
] satisfies AuthzRow[];
