'use client';

/** What the server reports while it reads and stores an upload (lib/datasets/http-upload.ts). */
export type ServerPhase =
  | { type: 'progress'; phase: 'reading'; bytes: number; rows: number }
  | { type: 'progress'; phase: 'summarising'; done: number; total: number }
  | { type: 'progress'; phase: 'hashing' }
  | { type: 'progress'; phase: 'storing'; done: number; total: number };

export interface UploadDone {
  type: 'done';
  dataset: { id: number };
  version: { id: number; version: number; sha256: string; rowCount: number };
  url: string;
}

export interface UploadFailure {
  type: 'error';
  status: number;
  error: { code: string; message: string; path: string };
}

export interface UploadState {
  stage: 'idle' | 'uploading' | 'server' | 'done' | 'failed';
  /** 0 … 1 for the bar. */
  fraction: number;
  label: string;
}

/**
 * Sends a file (or pasted text) to an upload route with XMLHttpRequest, because fetch cannot
 * report upload progress; the browser streams the file from disk, so a 50 MB file never sits
 * in page memory. Asks for the NDJSON progress stream and reports both halves: the bytes
 * going up (0–85 % of the bar) and the server's checking, hashing and storing (85–100 %).
 */
export function sendUpload(url: string, body: Blob, onState: (s: UploadState) => void, signal?: AbortSignal): Promise<UploadDone | UploadFailure> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    // Cancel aborts the request: the server sees the connection close, stops reading and
    // rolls back, so nothing is stored.
    const cancelled = (): UploadFailure => ({ type: 'error', status: 0, error: { code: 'cancelled:upload', message: 'Upload cancelled. Nothing was stored.', path: '' } });
    if (signal?.aborted) return resolve(cancelled());
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.onabort = () => resolve(cancelled());
    xhr.open('POST', url);
    xhr.setRequestHeader('content-type', body.type && !body.type.includes('json') ? body.type : 'text/csv');
    xhr.setRequestHeader('accept', 'application/x-ndjson');
    let seen = 0;
    let last: UploadDone | UploadFailure | null = null;
    const total = body.size;
    const mb = (n: number) => (n / 1024 / 1024).toFixed(1);

    const take = (final: boolean) => {
      const text = xhr.responseText;
      const end = final ? text.length : text.lastIndexOf('\n') + 1;
      if (end <= seen) return;
      for (const line of text.slice(seen, end).split('\n')) {
        if (!line.trim()) continue;
        let msg: ServerPhase | UploadDone | UploadFailure;
        try {
          msg = JSON.parse(line);
        } catch {
          continue;
        }
        if (msg.type === 'done' || msg.type === 'error') last = msg;
        else onState(serverState(msg));
      }
      seen = end;
    };

    xhr.upload.onprogress = (e) => {
      const sent = e.lengthComputable ? e.loaded : 0;
      onState({ stage: 'uploading', fraction: total ? (0.85 * sent) / total : 0, label: `Uploading and reading: ${mb(sent)} of ${mb(total)} MB` });
    };
    xhr.upload.onload = () => onState({ stage: 'server', fraction: 0.85, label: 'Checking the last rows…' });
    xhr.onprogress = () => take(false);
    xhr.onload = () => {
      take(true);
      if (last) return resolve(last);
      // A plain JSON answer (e.g. refused before the stream began: 401, 403, 409, 422).
      try {
        const body = JSON.parse(xhr.responseText);
        if (xhr.status >= 400) return resolve({ type: 'error', status: xhr.status, error: body.error });
        return resolve({ type: 'done', ...body });
      } catch {
        return resolve({ type: 'error', status: xhr.status, error: { code: 'internal:client', message: `The server answered ${xhr.status} without a readable message.`, path: '' } });
      }
    };
    xhr.onerror = () => resolve({ type: 'error', status: 0, error: { code: 'unavailable:network', message: 'The upload was interrupted (network error). Nothing was stored; please try again.', path: '' } });
    onState({ stage: 'uploading', fraction: 0, label: 'Starting the upload…' });
    xhr.send(body);
  });
}

function serverState(p: ServerPhase): UploadState {
  switch (p.phase) {
    case 'reading':
      return { stage: 'server', fraction: 0.85, label: `Reading: ${p.rows.toLocaleString('en')} rows so far` };
    case 'summarising':
      return { stage: 'server', fraction: 0.85 + (0.03 * p.done) / Math.max(1, p.total), label: `Summarising column ${p.done + 1} of ${p.total}` };
    case 'hashing':
      return { stage: 'server', fraction: 0.88, label: 'Computing the content hash (SHA-256)…' };
    case 'storing':
      return { stage: 'server', fraction: 0.9 + (0.1 * p.done) / Math.max(1, p.total), label: `Storing the version: ${p.done} of ${p.total} chunks` };
  }
}
