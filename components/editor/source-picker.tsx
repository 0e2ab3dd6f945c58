'use client';

import { SelectField } from './fields';

/** Chooses the Estimate block a histogram or convergence plot draws. */
export function SourcePicker(props: { value: string | null; estimates: { blockId: string; label: string }[]; onChange: (id: string) => void; disabled: boolean }) {
  return (
    <SelectField
      className="max-w-md"
      label="Draws the Estimate"
      value={props.value ?? ''}
      options={[{ value: '', label: 'Choose an Estimate…' }, ...props.estimates.map((e) => ({ value: e.blockId, label: e.label }))]}
      onChange={(v) => v && props.onChange(v)}
      disabled={props.disabled}
    />
  );
}
