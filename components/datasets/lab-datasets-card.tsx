import Link from 'next/link';
import { listDatasets } from '@/lib/datasets';
import { count } from './format';

/**
 * The lab home's list of datasets (server component). The page that renders it has already
 * checked that the viewer is a member of the lab (dataset:read).
 */
export async function LabDatasetsCard({ labId }: { labId: number }) {
  const datasets = await listDatasets(labId);
  return (
    <section aria-labelledby="lab-datasets-heading" className="rounded-lg border border-paper-edge bg-white/60 p-6">
      <div className="flex items-baseline justify-between">
        <h2 id="lab-datasets-heading" className="text-lg font-semibold">
          Datasets
        </h2>
        <Link href={`/labs/${labId}/datasets`} className="text-sm text-river hover:underline">
          All datasets
        </Link>
      </div>
      {datasets.length === 0 ? (
        <p className="mt-3 text-sm text-ink-faint">No datasets yet. Upload a CSV file or paste a table on the Datasets tab.</p>
      ) : (
        <ul className="mt-3 space-y-2 text-sm">
          {datasets.slice(0, 8).map((d) => (
            <li key={d.id} className="flex justify-between gap-2">
              <Link href={`/labs/${labId}/datasets/${d.id}`} className="truncate hover:underline">
                {d.name}
              </Link>
              <span className="shrink-0 text-ink-faint tabular">
                v{d.latest.version} · {count(d.latest.rowCount)} rows
              </span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
