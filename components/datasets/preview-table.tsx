'use client';

import type { Preview } from './preview';
import { TypeBadge } from './type-badge';

/** The first rows of the file as they will be read, with each column's detected type. */
export function PreviewTable({ preview }: { preview: Preview }) {
  if (preview.names.length === 0) return null;
  return (
    <div className="overflow-x-auto rounded-md border border-paper-edge bg-white">
      <table className="w-full text-sm" aria-label="Preview of the first rows">
        <thead className="bg-paper-deep/60 text-left">
          <tr>
            {preview.names.map((n, j) => (
              <th key={j} scope="col" className="px-3 py-1.5 font-medium">
                <span className="mr-2">{n}</span>
                <TypeBadge type={preview.types[j]} />
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="font-mono text-xs">
          {preview.rows.map((r, i) => (
            <tr key={i} className="border-t border-paper-edge/70">
              {preview.names.map((_, j) => (
                <td key={j} className="px-3 py-1 whitespace-nowrap">
                  {r[j]}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="border-t border-paper-edge px-3 py-1.5 text-xs text-ink-faint">Types are guessed from these first rows; the whole file decides.</p>
    </div>
  );
}
