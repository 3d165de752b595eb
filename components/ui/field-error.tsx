/** A field's error under it, with the ✕ mark so it is not told by colour alone; nothing when there is none. */
export function FieldError({ id, error }: { id?: string; error?: { message?: string } | string | null }) {
  const message = typeof error === "string" ? error : error?.message;
  if (!message) return null;
  return (
    <p id={id} className="field-error">
      <span aria-hidden="true">✕ </span>
      {message}
    </p>
  );
}

/** A warning under a field: a legal value that is unusual, which the user may keep. */
export function FieldWarning({ id, message }: { id?: string; message?: string | null }) {
  if (!message) return null;
  return (
    <p id={id} className="mt-1 text-xs font-medium text-caution" data-testid="field-warning">
      <span aria-hidden="true">⚠ </span>
      {message}
    </p>
  );
}
