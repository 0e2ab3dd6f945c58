import type { Metadata } from 'next';
import Link from 'next/link';
import { AppShell } from '@/components/app-shell';
import { count, when } from '@/components/datasets/format';
import { TypeBadge } from '@/components/datasets/type-badge';
import { UploadPanel } from '@/components/datasets/upload-panel';
import { LabNav } from '@/components/lab-nav';
import { can } from '@/lib/authz';
import { listDatasets } from '@/lib/datasets';
import { labPage } from '@/lib/labs/page-access';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Datasets' };

/** The lab's datasets, newest version of each; Authors and Owners can add one here. */
export default async function DatasetsPage({ params }: { params: Promise<{ labId: string }> }) {
  const { labId: raw } = await params;
  const { user, labId, membership, labs } = await labPage(raw, `/labs/${raw}/datasets`, 'dataset:read');
  const datasets = await listDatasets(labId);
  // What shows is cosmetic; the upload route authorizes dataset:write again.
  const writes = can(membership.role, 'dataset:write');

  return (
    <AppShell user={user} labs={labs} currentLabId={labId}>
      <p className="text-sm tracking-wide text-ink-faint uppercase">Lab</p>
      <h1 className="text-3xl font-semibold">{membership.labName}</h1>
      <LabNav labId={labId} role={membership.role} current="datasets" />

      <div className="mt-8 space-y-8">
        {writes && <UploadPanel labId={labId} defaultOpen={datasets.length === 0} />}
        <section aria-labelledby="datasets-heading">
          <h2 id="datasets-heading" className="text-xl font-semibold">
            Datasets
          </h2>
          {datasets.length === 0 ? (
            <p className="mt-3 rounded-md border border-dashed border-paper-edge p-8 text-center text-ink-faint">No datasets yet.</p>
          ) : (
            <ul className="mt-3 divide-y divide-paper-edge rounded-lg border border-paper-edge bg-white/60">
              {datasets.map((d) => (
                <li key={d.id} className="px-5 py-4">
                  <div className="flex flex-wrap items-baseline justify-between gap-2">
                    <Link href={`/labs/${labId}/datasets/${d.id}`} className="font-serif text-lg hover:underline">
                      {d.name}
                    </Link>
                    <span className="text-sm text-ink-soft tabular">
                      version {d.latest.version} · {count(d.latest.rowCount)} rows · {when(d.latest.createdAt)}
                    </span>
                  </div>
                  <p className="mt-1 flex flex-wrap gap-x-3 gap-y-1 text-sm">
                    {d.latest.columns.map((c) => (
                      <span key={c.name} className="inline-flex items-center gap-1">
                        {c.name} <TypeBadge type={c.type} />
                      </span>
                    ))}
                  </p>
                </li>
              ))}
            </ul>
          )}
        </section>
      </div>
    </AppShell>
  );
}
