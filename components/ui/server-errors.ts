import type { FieldValues, Path, UseFormSetError } from "react-hook-form";

/**
 * Puts a 422's field messages in place on a form. Paths may carry a prefix (e.g. "document.") that
 * the form does not have; messages for fields the form does not show are returned to be listed.
 */
export function applyServerErrors<T extends FieldValues>(
  setError: UseFormSetError<T>,
  fields: Record<string, string[]> | undefined,
  known: readonly string[],
  prefix = "",
): string[] {
  const rest: string[] = [];
  for (const [raw, messages] of Object.entries(fields ?? {})) {
    const path = prefix && raw.startsWith(prefix) ? raw.slice(prefix.length) : raw;
    const root = path.split(".")[0];
    if (known.includes(root)) setError(path as Path<T>, { type: "server", message: messages.join(" ") });
    else rest.push(...messages);
  }
  return rest;
}
