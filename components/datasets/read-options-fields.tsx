'use client';

import { DELIMITER_LABEL, DELIMITERS, type Delimiter, type ReadOptions } from '@/lib/datasets/options';

/** The three guesses a user may correct: delimiter, header row, decimal mark. */
export function ReadOptionsFields({ value, onChange }: { value: ReadOptions; onChange: (next: Partial<ReadOptions>) => void }) {
  return (
    <fieldset className="flex flex-wrap items-end gap-4 text-sm">
      <legend className="sr-only">How to read the file</legend>
      <label className="flex flex-col gap-1">
        <span className="text-ink-soft">Delimiter</span>
        <select
          value={value.delimiter}
          onChange={(e) => onChange({ delimiter: e.target.value as Delimiter })}
          className="rounded-md border border-paper-edge bg-white px-2 py-1.5"
        >
          {DELIMITERS.map((d) => (
            <option key={d} value={d}>
              {DELIMITER_LABEL[d]}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-1">
        <span className="text-ink-soft">Decimal mark</span>
        <select value={value.decimal} onChange={(e) => onChange({ decimal: e.target.value as '.' | ',' })} className="rounded-md border border-paper-edge bg-white px-2 py-1.5">
          <option value=".">point (2.85)</option>
          <option value=",">comma (2,85)</option>
        </select>
      </label>
      <label className="flex items-center gap-2 pb-1.5">
        <input type="checkbox" checked={value.header} onChange={(e) => onChange({ header: e.target.checked })} className="size-4 accent-river" />
        <span>First line holds column names</span>
      </label>
    </fieldset>
  );
}
