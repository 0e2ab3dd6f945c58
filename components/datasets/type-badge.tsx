import type { ColumnType } from '@/db/tables/datasets';

const STYLE: Record<ColumnType, string> = {
  number: 'bg-river-wash text-river',
  text: 'bg-paper-deep text-ink-soft',
  date: 'bg-moss-wash text-moss',
};

/** The type of a column as a small tag: number, text or date. */
export function TypeBadge({ type }: { type: ColumnType }) {
  return <span className={`rounded px-1.5 py-0.5 font-mono text-[11px] tracking-wide ${STYLE[type]}`}>{type}</span>;
}
