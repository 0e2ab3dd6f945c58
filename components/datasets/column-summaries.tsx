import type { ColumnMeta } from '@/db/tables/datasets';
import { count, figure } from './format';
import { TypeBadge } from './type-badge';

/** One card per column: type, missing values and the summary that fits its type. */
export function ColumnSummaries({ columns, rowCount }: { columns: ColumnMeta[]; rowCount: number }) {
  return (
    <section aria-labelledby="summaries-heading">
      <h2 id="summaries-heading" className="text-lg font-semibold">
        Columns
      </h2>
      <ul className="mt-3 grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        {columns.map((c) => (
          <li key={c.name} className="rounded-lg border border-paper-edge bg-white/70 p-4" aria-label={`Column ${c.name}`}>
            <div className="flex items-center justify-between gap-2">
              <h3 className="truncate font-sans font-medium" title={c.name}>
                {c.name}
              </h3>
              <TypeBadge type={c.type} />
            </div>
            <p className={`mt-1 text-xs ${c.missing ? 'text-amber' : 'text-ink-faint'}`}>
              {c.missing ? `${count(c.missing)} missing of ${count(rowCount)}` : 'no missing values'}
            </p>
            <Summary meta={c} />
          </li>
        ))}
      </ul>
    </section>
  );
}

function Summary({ meta }: { meta: ColumnMeta }) {
  const s = meta.summary;
  if (s.kind === 'empty') return <p className="mt-2 text-sm text-ink-faint">Every value is missing.</p>;
  if (s.kind === 'number') {
    const items: [string, number | null][] = [
      ['mean', s.mean],
      ['sd', s.sd],
      ['min', s.min],
      ['lower quartile', s.q1],
      ['median', s.median],
      ['upper quartile', s.q3],
      ['max', s.max],
    ];
    return (
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
        {items.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-ink-faint">{k}</dt>
            <dd className="text-right font-mono text-xs leading-5 tabular">{figure(v)}</dd>
          </div>
        ))}
      </dl>
    );
  }
  if (s.kind === 'date') {
    return (
      <p className="mt-2 text-sm">
        <span className="font-mono text-xs">{s.min}</span> to <span className="font-mono text-xs">{s.max}</span>
        <span className="block text-xs text-ink-faint">
          {s.distinctCapped ? `more than ${count(s.distinct)}` : count(s.distinct)} different values
        </span>
      </p>
    );
  }
  return (
    <div className="mt-2 text-sm">
      <p className="text-xs text-ink-faint">{s.distinctCapped ? `more than ${count(s.distinct)}` : count(s.distinct)} different values</p>
      <ul className="mt-1 space-y-0.5">
        {s.top.map((t) => (
          <li key={t.value} className="flex justify-between gap-2">
            <span className="truncate" title={t.value}>
              {t.value}
            </span>
            <span className="font-mono text-xs text-ink-faint tabular">{count(t.count)}</span>
          </li>
        ))}
      </ul>
      {s.mostlyNumbers && (
        <p className="mt-2 rounded bg-amber-wash px-2 py-1 text-xs text-amber">
          Mostly numbers ({count(s.mostlyNumbers.numbers)}), read as text because of {count(s.mostlyNumbers.others)} other value{s.mostlyNumbers.others === 1 ? '' : 's'}, first on line{' '}
          {s.mostlyNumbers.firstLine}: “{s.mostlyNumbers.example}”. Fix or blank those cells to use it as a number column.
        </p>
      )}
    </div>
  );
}
