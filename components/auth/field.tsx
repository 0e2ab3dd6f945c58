/**
 * A labelled form field with its error beside it (linked by aria-describedby). Ids follow
 * `field-<name>` and `field-<name>-error`, which the browser tests rely on. `prefix`
 * keeps ids unique when a page has several forms with the same field names.
 */
export function Field(props: {
  label: string;
  name: string;
  type?: string;
  autoComplete?: string;
  error?: string;
  hint?: string;
  defaultValue?: string;
  readOnly?: boolean;
  prefix?: string;
  maxLength?: number;
}) {
  const id = `${props.prefix ? `${props.prefix}-` : ''}field-${props.name}`;
  const describedBy = [props.hint ? `${id}-hint` : '', props.error ? `${id}-error` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-medium text-ink-soft">
        {props.label}
      </label>
      <input
        id={id}
        name={props.name}
        type={props.type ?? 'text'}
        autoComplete={props.autoComplete}
        defaultValue={props.defaultValue}
        readOnly={props.readOnly}
        maxLength={props.maxLength}
        aria-invalid={!!props.error}
        aria-describedby={describedBy}
        className="mt-1 w-full rounded-md border border-paper-edge bg-white px-3 py-2 outline-none read-only:bg-paper-deep read-only:text-ink-soft focus:border-river aria-[invalid=true]:border-oxide"
      />
      {props.hint && (
        <p id={`${id}-hint`} className="mt-1 text-xs text-ink-faint">
          {props.hint}
        </p>
      )}
      {props.error && (
        <p id={`${id}-error`} className="mt-1 text-sm text-oxide">
          {props.error}
        </p>
      )}
    </div>
  );
}

/** A select with its label and error, same id scheme as Field. */
export function SelectField(props: { label: string; name: string; options: { value: string; label: string }[]; defaultValue?: string; error?: string; prefix?: string }) {
  const id = `${props.prefix ? `${props.prefix}-` : ''}field-${props.name}`;
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-medium text-ink-soft">
        {props.label}
      </label>
      <select
        id={id}
        name={props.name}
        defaultValue={props.defaultValue}
        aria-invalid={!!props.error}
        aria-describedby={props.error ? `${id}-error` : undefined}
        className="mt-1 w-full rounded-md border border-paper-edge bg-white px-3 py-2 outline-none focus:border-river"
      >
        {props.options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {props.error && (
        <p id={`${id}-error`} className="mt-1 text-sm text-oxide">
          {props.error}
        </p>
      )}
    </div>
  );
}

/** The form's message line: announced by screen readers when it changes. */
export function FormStatus({ message, tone = 'error' }: { message?: string; tone?: 'error' | 'ok' }) {
  return (
    <p aria-live="polite" role="status" className={`min-h-5 text-sm ${tone === 'ok' ? 'text-moss' : 'text-oxide'}`}>
      {message}
    </p>
  );
}

export function SubmitButton({ pending, label, pendingLabel, tone = 'primary' }: { pending: boolean; label: string; pendingLabel: string; tone?: 'primary' | 'quiet' }) {
  const cls =
    tone === 'primary'
      ? 'rounded-md bg-ink px-4 py-2.5 font-medium text-paper transition hover:bg-ink-soft disabled:opacity-60'
      : 'rounded-md border border-paper-edge bg-white px-4 py-2 font-medium text-ink transition hover:bg-paper-deep disabled:opacity-60';
  return (
    <button type="submit" disabled={pending} className={cls}>
      {pending ? pendingLabel : label}
    </button>
  );
}
