'use client';

import { useRouter } from 'next/navigation';
import { useEffect, useId, useRef, useState } from 'react';
import { MAX_UPLOAD_BYTES } from '@/lib/datasets/limits';
import { delimiterName, type ReadOptions } from '@/lib/datasets/options';
import { bytes } from './format';
import { fileSample, previewOf, type Preview } from './preview';
import { PreviewTable } from './preview-table';
import { ReadOptionsFields } from './read-options-fields';
import { sendUpload, type UploadState } from './upload-client';

type Source = { kind: 'file'; file: File; sample: { bytes: Uint8Array; whole: boolean } } | { kind: 'paste'; text: string };

/**
 * Upload a CSV file or paste a table, as a new dataset (`datasetId` absent) or as the next
 * version of one. Shows the guessed delimiter, header and decimal mark over a preview of the
 * first rows, lets the user correct them, then streams the file up with a progress bar.
 */
export function UploadPanel({ labId, datasetId, defaultOpen = false }: { labId: number; datasetId?: number; defaultOpen?: boolean }) {
  const router = useRouter();
  const ids = useId();
  const [open, setOpen] = useState(defaultOpen);
  const [tab, setTab] = useState<'file' | 'paste'>('file');
  const [source, setSource] = useState<Source | null>(null);
  const [pasted, setPasted] = useState('');
  const [name, setName] = useState('');
  const [given, setGiven] = useState<Partial<ReadOptions>>({});
  const [preview, setPreview] = useState<Preview | null>(null);
  const [state, setState] = useState<UploadState>({ stage: 'idle', fraction: 0, label: '' });
  const [error, setError] = useState<string | null>(null);
  const busy = state.stage === 'uploading' || state.stage === 'server';
  const upload = useRef<AbortController | null>(null);
  useEffect(() => () => upload.current?.abort(), []);

  useEffect(() => {
    if (!source) return setPreview(null);
    setPreview(source.kind === 'file' ? previewOf(source.sample, given) : previewOf({ text: source.text }, given));
  }, [source, given]);

  async function chooseFile(file: File | undefined) {
    setError(null);
    setState({ stage: 'idle', fraction: 0, label: '' });
    if (!file) return setSource(null);
    if (file.size > MAX_UPLOAD_BYTES) return setError(`The file is ${bytes(file.size)}; one upload may hold at most ${bytes(MAX_UPLOAD_BYTES)}.`);
    setGiven({});
    if (!name && datasetId === undefined) setName(file.name.replace(/\.(csv|tsv|txt)$/i, '').slice(0, 120));
    setSource({ kind: 'file', file, sample: await fileSample(file) });
  }

  function takePaste(text: string) {
    setPasted(text);
    setError(null);
    setGiven({});
    setSource(text.trim() ? { kind: 'paste', text } : null);
  }

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setError(null);
    if (!source || !preview) return setError(tab === 'file' ? 'Choose a CSV file first.' : 'Paste a table first.');
    if (datasetId === undefined && !name.trim()) return setError('Give the dataset a name.');
    const o = preview.options;
    const q = new URLSearchParams({ delimiter: delimiterName(o.delimiter), header: String(o.header), decimal: o.decimal === ',' ? 'comma' : 'point', source: source.kind === 'file' ? 'upload' : 'paste' });
    if (datasetId === undefined) q.set('name', name.trim());
    if (source.kind === 'file') q.set('fileName', source.file.name.slice(0, 255));
    const url = datasetId === undefined ? `/api/labs/${labId}/datasets?${q}` : `/api/labs/${labId}/datasets/${datasetId}/versions?${q}`;
    const body = source.kind === 'file' ? source.file : new Blob([source.text], { type: 'text/csv' });
    upload.current = new AbortController();
    const result = await sendUpload(url, body, setState, upload.current.signal);
    upload.current = null;
    if (result.type === 'error') {
      setState({ stage: result.error.code === 'cancelled:upload' ? 'idle' : 'failed', fraction: 0, label: '' });
      setError(result.error.message);
      return;
    }
    setState({ stage: 'done', fraction: 1, label: `Stored as version ${result.version.version}: ${result.version.rowCount.toLocaleString('en')} rows.` });
    setSource(null);
    setPasted('');
    router.push(result.url);
    router.refresh();
  }

  if (!open) {
    return (
      <button type="button" onClick={() => setOpen(true)} className="rounded-md bg-oxide px-4 py-2 text-sm font-medium text-paper hover:bg-oxide/90">
        {datasetId === undefined ? 'Add a dataset' : 'Upload a new version'}
      </button>
    );
  }

  return (
    <form onSubmit={submit} aria-labelledby={`${ids}-title`} className="space-y-4 rounded-lg border border-paper-edge bg-white/70 p-5">
      <div className="flex items-baseline justify-between">
        <h2 id={`${ids}-title`} className="text-lg font-semibold">
          {datasetId === undefined ? 'Add a dataset' : 'Upload a new version'}
        </h2>
        <p className="text-xs text-ink-faint">{datasetId === undefined ? 'Stored as version 1.' : 'Earlier versions stay as they are.'}</p>
      </div>

      <div role="tablist" aria-label="Where the table comes from" className="flex gap-1 text-sm">
        {(['file', 'paste'] as const).map((t) => (
          <button
            key={t}
            type="button"
            role="tab"
            aria-selected={tab === t}
            onClick={() => {
              setTab(t);
              setSource(null);
              setError(null);
            }}
            className={`rounded px-3 py-1 ${tab === t ? 'bg-river-wash text-river' : 'text-ink-soft hover:bg-paper-deep'}`}
          >
            {t === 'file' ? 'CSV file' : 'Paste a table'}
          </button>
        ))}
      </div>

      {tab === 'file' ? (
        <label
          className="flex cursor-pointer flex-col items-center gap-1 rounded-md border border-dashed border-river-soft bg-river-wash/30 px-4 py-6 text-sm"
          onDragOver={(e) => e.preventDefault()}
          onDrop={(e) => {
            e.preventDefault();
            void chooseFile(e.dataTransfer.files[0]);
          }}
        >
          <span className="font-medium">{source?.kind === 'file' ? `${source.file.name} · ${bytes(source.file.size)}` : 'Choose a CSV file, or drop it here'}</span>
          <span className="text-xs text-ink-faint">UTF-8 text, up to {bytes(MAX_UPLOAD_BYTES)}</span>
          <input type="file" accept=".csv,.tsv,.txt,text/csv,text/plain" className="sr-only" aria-label="CSV file" disabled={busy} onChange={(e) => void chooseFile(e.target.files?.[0])} />
        </label>
      ) : (
        <label className="block text-sm">
          <span className="text-ink-soft">Table (from a spreadsheet or text: columns separated by tabs, commas or semicolons)</span>
          <textarea
            value={pasted}
            onChange={(e) => takePaste(e.target.value)}
            rows={8}
            spellCheck={false}
            disabled={busy}
            className="mt-1 w-full rounded-md border border-paper-edge bg-white px-3 py-2 font-mono text-xs"
            placeholder={'site\tnitrate_mg_l\nupstream\t2.1\ndownstream\t3.4'}
          />
        </label>
      )}

      {datasetId === undefined && (
        <label className="block text-sm">
          <span className="text-ink-soft">Dataset name</span>
          <input value={name} onChange={(e) => setName(e.target.value)} maxLength={120} disabled={busy} className="mt-1 w-full rounded-md border border-paper-edge bg-white px-3 py-2" />
        </label>
      )}

      {preview && (
        <div className="space-y-3">
          <ReadOptionsFields value={preview.options} onChange={(next) => setGiven((g) => ({ ...g, ...preview.options, ...next }))} />
          {preview.problem ? <p className="rounded-md bg-amber-wash px-3 py-2 text-sm text-amber">{preview.problem}</p> : <PreviewTable preview={preview} />}
        </div>
      )}

      {state.stage !== 'idle' && state.stage !== 'failed' && (
        <div className="space-y-1">
          <div
            role="progressbar"
            aria-label="Upload progress"
            aria-valuemin={0}
            aria-valuemax={100}
            aria-valuenow={Math.round(state.fraction * 100)}
            className="h-2 overflow-hidden rounded-full bg-paper-deep"
          >
            <div className="h-full bg-river transition-[width] duration-200" style={{ width: `${Math.round(state.fraction * 100)}%` }} />
          </div>
          <p className="text-xs text-ink-soft tabular">{state.label}</p>
        </div>
      )}

      <p role="alert" aria-live="assertive" className="min-h-5 text-sm text-oxide">
        {error}
      </p>

      <div className="flex gap-3">
        <button type="submit" disabled={busy || !source} className="rounded-md bg-ink px-4 py-2 text-sm font-medium text-paper hover:bg-ink-soft disabled:opacity-50">
          {busy ? 'Uploading…' : datasetId === undefined ? 'Create dataset' : 'Store as new version'}
        </button>
        {busy ? (
          <button type="button" onClick={() => upload.current?.abort()} className="rounded-md border border-oxide/50 px-3 py-2 text-sm text-oxide hover:bg-oxide-wash">
            Cancel upload
          </button>
        ) : (
          <button type="button" onClick={() => setOpen(false)} className="rounded-md px-3 py-2 text-sm text-ink-soft hover:bg-paper-deep">
            Cancel
          </button>
        )}
      </div>
    </form>
  );
}
