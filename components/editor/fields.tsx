'use client';

import { useEffect, useId, useState } from 'react';

const inputClass = 'w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm text-ink disabled:bg-paper-deep/60 disabled:text-ink-soft';

export function Field(props: { label: string; children: (id: string) => React.ReactNode; hint?: string; className?: string }) {
  const id = useId();
  return (
    <div className={props.className}>
      <label htmlFor={id} className="mb-0.5 block text-xs font-medium text-ink-soft">
        {props.label}
      </label>
      {props.children(id)}
      {props.hint && <p className="mt-0.5 text-[11px] text-ink-faint">{props.hint}</p>}
    </div>
  );
}

export function SelectField<T extends string>(props: { label: string; value: T; options: { value: T; label: string }[]; onChange: (v: T) => void; disabled?: boolean; className?: string }) {
  return (
    <Field label={props.label} className={props.className}>
      {(id) => (
        <select id={id} className={inputClass} value={props.value} disabled={props.disabled} onChange={(e) => props.onChange(e.target.value as T)}>
          {!props.options.some((o) => o.value === props.value) && <option value={props.value}>{props.value || '—'}</option>}
          {props.options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
      )}
    </Field>
  );
}

/**
 * A text or number input that keeps what the person types locally and passes it on as they
 * type; a number field passes a number only when the text parses as one, so "0." or "" do
 * not reach the document half-typed.
 */
export function TextField(props: { label: string; value: string | number; onChange: (v: string) => void; number?: boolean; disabled?: boolean; hint?: string; className?: string; step?: string }) {
  const [text, setText] = useState(String(props.value));
  useEffect(() => {
    setText((t) => (props.number ? (Number(t) === Number(props.value) ? t : String(props.value)) : t === String(props.value) ? t : String(props.value)));
  }, [props.value, props.number]);
  return (
    <Field label={props.label} hint={props.hint} className={props.className}>
      {(id) => (
        <input
          id={id}
          className={`${inputClass} ${props.number ? 'tabular' : ''}`}
          inputMode={props.number ? 'decimal' : undefined}
          value={text}
          step={props.step}
          disabled={props.disabled}
          onChange={(e) => {
            setText(e.target.value);
            props.onChange(e.target.value);
          }}
        />
      )}
    </Field>
  );
}

export function CheckField(props: { label: string; checked: boolean; onChange: (v: boolean) => void; disabled?: boolean }) {
  const id = useId();
  return (
    <span className="inline-flex items-center gap-1.5 text-sm">
      <input id={id} type="checkbox" className="accent-river" checked={props.checked} disabled={props.disabled} onChange={(e) => props.onChange(e.target.checked)} />
      <label htmlFor={id}>{props.label}</label>
    </span>
  );
}

/** Parses a number field: a finite number, or null while the text is not one yet. */
export function parseNumber(text: string): number | null {
  if (text.trim() === '') return null;
  const n = Number(text.replace(/[\s,_]/g, ''));
  return Number.isFinite(n) ? n : null;
}
