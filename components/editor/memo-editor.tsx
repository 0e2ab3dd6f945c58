'use client';

import { EditorContent, useEditor, useEditorState } from '@tiptap/react';
import { useMemo, useState } from 'react';
import { clientNodes } from '@/blocks/registry.client';
import type { DocJson } from '@/db/schema';
import { memoExtensions } from '@/lib/memos/extensions';
import type { RunView, UnreadyView } from '@/lib/runs/types';
import { api } from './api';
import { CautionBanner } from './caution-banner';
import { InsertMenu } from './insert-menu';
import { LiveValuePicker } from './live-value-picker';
import { MemoContext, type MemoContextValue, type PickerDataset } from './memo-context';
import { ResultsStore } from './results-store';
import { useAutosave, type SaveStatus } from './use-autosave';

export interface MemoEditorProps {
  labId: number;
  memoId: number;
  title: string;
  doc: DocJson;
  revision: number;
  archived: boolean;
  canWrite: boolean;
  canCompute: boolean;
  datasets: PickerDataset[];
  initial: Record<string, { settingsJson: string; view: RunView | UnreadyView }>;
}

const STATUS_TEXT: Record<SaveStatus['kind'], string> = { saved: 'All changes saved', dirty: 'Unsaved changes', saving: 'Saving…', error: 'Not saved', conflict: 'Not saved' };

/** The memo: title, standing caution, toolbar and the TipTap editor with live blocks. */
export function MemoEditor(props: MemoEditorProps) {
  const writable = props.canWrite && !props.archived;
  const [store] = useState(() => new ResultsStore());
  const extensions = useMemo(() => memoExtensions(clientNodes()), []);
  const editor = useEditor({
    extensions,
    content: props.doc,
    editable: writable,
    immediatelyRender: false,
    editorProps: { attributes: { 'aria-label': 'Memo text', class: 'min-h-[40vh] outline-none' } },
  });
  const { status } = useAutosave(editor, { labId: props.labId, memoId: props.memoId, revision: props.revision, enabled: writable });
  const ctx: MemoContextValue = useMemo(
    () => ({ labId: props.labId, memoId: props.memoId, canWrite: writable, canCompute: props.canCompute, datasets: props.datasets, store, initial: props.initial }),
    [props.labId, props.memoId, writable, props.canCompute, props.datasets, store, props.initial],
  );

  return (
    <MemoContext.Provider value={ctx}>
      <div className="space-y-4">
        <TitleField labId={props.labId} memoId={props.memoId} title={props.title} editable={writable} />
        {props.archived && <p className="rounded bg-paper-deep px-3 py-2 text-sm">This memo is archived and read-only. Restore it from the memo list to edit.</p>}
        <CautionBanner />
        {editor && writable && (
          <div className="sticky top-0 z-20 flex flex-wrap items-center gap-2 border-b border-paper-edge bg-paper/95 py-2 backdrop-blur">
            <FormatButtons editor={editor} />
            <span className="mx-1 h-5 w-px bg-paper-edge" aria-hidden />
            <InsertMenu editor={editor} datasets={props.datasets} />
            <LiveValuePicker editor={editor} />
            <p role="status" aria-live="polite" className={`ml-auto text-xs ${status.kind === 'error' || status.kind === 'conflict' ? 'text-oxide' : 'text-ink-faint'}`} data-save-status={status.kind}>
              {STATUS_TEXT[status.kind]}
              {'message' in status ? `: ${status.message}` : ''}
              {status.kind === 'conflict' && (
                <button type="button" className="ml-2 underline" onClick={() => window.location.reload()}>
                  Reload
                </button>
              )}
            </p>
          </div>
        )}
        {!writable && <p className="text-xs text-ink-faint">Read-only: your role in this lab lets you read this memo{props.canCompute ? '' : ' and its results'}.</p>}
        <article
          className="memo-text font-serif text-[1.05rem] leading-relaxed text-ink [&_.ProseMirror_blockquote]:border-l-2 [&_.ProseMirror_blockquote]:border-oxide-soft [&_.ProseMirror_blockquote]:pl-4 [&_.ProseMirror_blockquote]:italic [&_.ProseMirror_h1]:mt-6 [&_.ProseMirror_h1]:text-3xl [&_.ProseMirror_h1]:font-semibold [&_.ProseMirror_h2]:mt-6 [&_.ProseMirror_h2]:text-2xl [&_.ProseMirror_h2]:font-semibold [&_.ProseMirror_h3]:mt-4 [&_.ProseMirror_h3]:text-xl [&_.ProseMirror_h3]:font-semibold [&_.ProseMirror_ol]:list-decimal [&_.ProseMirror_ol]:pl-6 [&_.ProseMirror_p]:my-3 [&_.ProseMirror_ul]:list-disc [&_.ProseMirror_ul]:pl-6 [&_.ProseMirror_a]:text-river [&_.ProseMirror_a]:underline"
        >
          <EditorContent editor={editor} />
        </article>
      </div>
    </MemoContext.Provider>
  );
}

function FormatButtons({ editor }: { editor: NonNullable<ReturnType<typeof useEditor>> }) {
  const active = useEditorState({
    editor,
    selector: ({ editor: e }) => ({
      bold: e.isActive('bold'),
      italic: e.isActive('italic'),
      h2: e.isActive('heading', { level: 2 }),
      h3: e.isActive('heading', { level: 3 }),
      bullet: e.isActive('bulletList'),
      ordered: e.isActive('orderedList'),
    }),
  });
  const b = (label: string, on: boolean, run: () => void, text: React.ReactNode) => (
    <button type="button" aria-label={label} aria-pressed={on} onClick={run} className={`min-w-8 rounded px-2 py-1 text-sm ${on ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-deep'}`}>
      {text}
    </button>
  );
  const chain = () => editor.chain().focus();
  return (
    <div className="flex gap-1" role="group" aria-label="Text format">
      {b('Bold', active.bold, () => chain().toggleBold().run(), <strong>B</strong>)}
      {b('Italic', active.italic, () => chain().toggleItalic().run(), <em>I</em>)}
      {b('Heading', active.h2, () => chain().toggleHeading({ level: 2 }).run(), 'H2')}
      {b('Subheading', active.h3, () => chain().toggleHeading({ level: 3 }).run(), 'H3')}
      {b('Bulleted list', active.bullet, () => chain().toggleBulletList().run(), '•')}
      {b('Numbered list', active.ordered, () => chain().toggleOrderedList().run(), '1.')}
    </div>
  );
}

function TitleField(props: { labId: number; memoId: number; title: string; editable: boolean }) {
  const [title, setTitle] = useState(props.title);
  const [saved, setSaved] = useState(props.title);
  const [error, setError] = useState<string | null>(null);
  const commit = async () => {
    const t = title.trim();
    if (!t || t === saved) return setTitle(saved);
    try {
      await api(`/api/labs/${props.labId}/memos/${props.memoId}`, { method: 'PATCH', json: { title: t } });
      setSaved(t);
      setError(null);
    } catch (e) {
      setError((e as Error).message);
    }
  };
  if (!props.editable) return <h1 className="text-3xl font-semibold">{props.title}</h1>;
  return (
    <div>
      <label htmlFor="memo-title" className="sr-only">
        Memo title
      </label>
      <input
        id="memo-title"
        value={title}
        maxLength={200}
        onChange={(e) => setTitle(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => e.key === 'Enter' && (e.target as HTMLInputElement).blur()}
        className="w-full bg-transparent font-serif text-3xl font-semibold text-ink outline-none focus:border-b focus:border-paper-edge"
      />
      {error && (
        <p role="alert" className="text-sm text-oxide">
          {error}
        </p>
      )}
    </div>
  );
}
