/**
 * The line under a form field: its error when there is one, else its hint. Ids follow
 * `${id}-error` / `${id}-hint`, so the input points at the line with {@link describedBy}.
 * `alert` announces an error as it appears (for fields validated while the user types).
 */
export function FieldMessage({
  id,
  error,
  hint,
  alert = false,
}: {
  id: string;
  error?: string | null | undefined;
  hint?: string | null | undefined;
  alert?: boolean;
}) {
  if (error) {
    return (
      <p className="field-error" id={`${id}-error`} role={alert ? 'alert' : undefined}>
        {error}
      </p>
    );
  }
  if (hint) {
    return (
      <p className="field-hint" id={`${id}-hint`}>
        {hint}
      </p>
    );
  }
  return null;
}

/** The `aria-describedby` value matching {@link FieldMessage}'s line, or undefined when it shows none. */
export function describedBy(
  id: string,
  error?: string | null,
  hint?: string | null,
): string | undefined {
  return error ? `${id}-error` : hint ? `${id}-hint` : undefined;
}
