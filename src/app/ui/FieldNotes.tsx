/* What every input shares under its box: its hint and its error. */

/** The ids an input is described by: its hint and its error, when shown. */
export function describedBy(id: string, hint: string | undefined, error: string | undefined): string | undefined {
  return [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ') || undefined;
}

/** A field's hint and error under its box. */
export function FieldNotes({ id, hint, error }: { id: string; hint: string | undefined; error: string | undefined }) {
  return (
    <>
      {hint && (
        <p id={`${id}-hint`} class="field-hint">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} class="field-error">
          {error}
        </p>
      )}
    </>
  );
}
