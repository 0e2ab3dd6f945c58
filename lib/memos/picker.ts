import 'server-only';
import type { PickerDataset } from '@/components/editor/memo-context';
import { listDatasets } from '@/lib/datasets';

/**
 * The lab's datasets as block settings pickers need them: columns with their types and,
 * for text columns, their most frequent values (for row filters and group choices).
 */
export async function pickerDatasets(labId: number): Promise<PickerDataset[]> {
  const list = await listDatasets(labId);
  return list.map((d) => ({
    id: d.id,
    name: d.name,
    latestVersionId: d.latest.id,
    latestVersion: d.latest.version,
    rowCount: d.latest.rowCount,
    columns: d.latest.columns.map((c) => ({
      name: c.name,
      type: c.type,
      values: c.summary.kind === 'text' ? c.summary.top.map((t) => t.value) : undefined,
    })),
  }));
}
