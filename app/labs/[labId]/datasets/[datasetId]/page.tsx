import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { AppShell } from '@/components/app-shell';
import { ColumnSummaries } from '@/components/datasets/column-summaries';
import { DataGrid } from '@/components/datasets/data-grid';
import { bytes, count, when } from '@/components/datasets/format';
import { UploadPanel } from '@/components/datasets/upload-panel';
import { VersionHistory } from '@/components/datasets/version-history';
import { LabNav } from '@/components/lab-nav';
import { can } from '@/lib/authz';
import { datasetWithVersions, versionOfDataset } from '@/lib/datasets';
import { DELIMITER_LABEL } from '@/lib/datasets/options';
import { AppError } from '@/lib/errors';
import { idParam, labPage } from '@/lib/labs/page-access';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Dataset' };

/** One dataset: the chosen version (?v=N, else the newest) as a scrolling table, its column summaries and the version history. */
export default async function DatasetPage({ params, searchParams }: { params: Promise<{ labId: string; datasetId: string }>; searchParams: Promise<{ v?: string }> }) {
  const { labId: rawLab, datasetId: rawDataset } = await params;
  const { user, labId, membership, labs } = await labPage(rawLab, `/labs/${rawLab}/datasets/${rawDataset}`, 'dataset:read');
  const datasetId = idParam(rawDataset);
  if (!datasetId) notFound();

  let found;
  try {
    found = await datasetWithVersions(labId, datasetId);
  } catch (e) {
    if (e instanceof AppError && e.kind === 'not_found') notFound();
    throw e;
  }
  const { dataset, versions } = found;
  const asked = Number((await searchParams).v);
  const number = Number.isInteger(asked) && versions.some((v) => v.version === asked) ? asked : dataset.latestVersion;
  const version = await versionOfDataset(labId, datasetId, number);
  const writes = can(membership.role, 'dataset:write');
  const src = version.source;

  return (
    <AppShell user={user} labs={labs} currentLabId={labId}>
      <p className="text-sm tracking-wide text-ink-faint uppercase">Lab</p>
      <h1 className="text-3xl font-semibold">{membership.labName}</h1>
      <LabNav labId={labId} role={membership.role} current="datasets" />

      <div className="mt-6 flex flex-wrap items-end justify-between gap-4">
        <div>
          <Link href={`/labs/${labId}/datasets`} className="text-sm text-river hover:underline">
            ← Datasets
          </Link>
          <h2 className="mt-1 text-2xl font-semibold">{dataset.name}</h2>
          <p className="mt-1 text-sm text-ink-soft tabular">
            Version {version.version} of {dataset.latestVersion} · {count(version.rowCount)} rows × {version.columns.length} columns · {when(version.createdAt)}
          </p>
          <p className="mt-1 font-mono text-xs text-ink-faint" title="SHA-256 of the table's canonical form: equal tables have equal hashes">
            sha256 {version.sha256}
          </p>
          {src.delimiter && (
            <p className="mt-1 text-xs text-ink-faint">
              Read as {DELIMITER_LABEL[src.delimiter as keyof typeof DELIMITER_LABEL] ?? src.delimiter}-separated, {src.header ? 'first line as column names' : 'no header line'}, decimal {src.decimal === ',' ? 'comma' : 'point'}
              {src.bytes ? ` · ${bytes(src.bytes)}` : ''}
              {src.fileName ? ` · ${src.fileName}` : ''}
            </p>
          )}
        </div>
        {writes && <UploadPanel labId={labId} datasetId={datasetId} />}
      </div>
      {version.superseded && (
        <p className="mt-4 rounded-md bg-amber-wash px-4 py-2 text-sm text-amber">
          This is an earlier version.{' '}
          <Link href={`/labs/${labId}/datasets/${datasetId}`} className="underline">
            See version {dataset.latestVersion}, the newest
          </Link>
          .
        </p>
      )}

      <div className="mt-6 grid gap-8 lg:grid-cols-[1fr_18rem]">
        <div className="min-w-0 space-y-8">
          <DataGrid key={version.version} labId={labId} datasetId={datasetId} version={version.version} rowCount={version.rowCount} columns={version.columns.map((c) => ({ name: c.name, type: c.type }))} />
          <ColumnSummaries columns={version.columns} rowCount={version.rowCount} />
        </div>
        <VersionHistory labId={labId} datasetId={datasetId} versions={versions} current={version.version} />
      </div>
    </AppShell>
  );
}
