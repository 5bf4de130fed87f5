import type { ChangeEvent } from 'react';
import { FieldMessage, describedBy } from '@/components/FieldMessage';
import type { CompoundDraft, FieldErrors } from '../compound-form-model';

/** The Compound area's labelled input and its save-state badge. */

export type SaveState = 'saved' | 'pending' | 'invalid' | 'error';

interface FieldProps {
  id: keyof CompoundDraft;
  label: string;
  unit?: string;
  hint?: string;
  draft: CompoundDraft;
  errors: FieldErrors;
  onChange: (id: keyof CompoundDraft, value: string) => void;
  wide?: boolean;
  inputMode?: 'decimal' | 'text';
}

export function Field({
  id,
  label,
  unit,
  hint,
  draft,
  errors,
  onChange,
  wide,
  inputMode,
}: FieldProps) {
  const error = errors[id];
  const inputId = `compound-${id}`;
  return (
    <div className={`field${wide ? ' field-wide' : ''}`}>
      <label htmlFor={inputId}>
        {label}
        {unit ? <span className="unit"> ({unit})</span> : null}
      </label>
      <input
        id={inputId}
        name={id}
        value={draft[id]}
        inputMode={inputMode}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(inputId, error, hint)}
        onChange={(e: ChangeEvent<HTMLInputElement>) => onChange(id, e.target.value)}
      />
      <FieldMessage id={inputId} error={error} hint={hint} alert />
    </div>
  );
}

export function SaveBadge({ state }: { state: SaveState | 'lost' }) {
  const text: Record<SaveState | 'lost', string> = {
    lost: 'Not saved: the database was closed — reload this tab',
    saved: 'All changes saved',
    pending: 'Saving…',
    invalid: 'Not saved: fix the marked field',
    error: 'Could not save — your last saved values are kept',
  };
  return (
    <span
      className={`save-badge save-${state === 'lost' ? 'error' : state}`}
      role="status"
      aria-live="polite"
      aria-label={`Save state: ${text[state]}`}
    >
      {text[state]}
    </span>
  );
}
