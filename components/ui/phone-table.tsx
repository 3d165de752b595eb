/**
 * A table that is a table on a wide screen and a list of small cards on a phone: each row wraps its
 * cells side by side under the first one, and the column headers give way to words before a value.
 * One set of elements serves both widths, so a control is never there twice.
 */
export const phoneTable = {
  table: "block w-full text-sm sm:table",
  head: "hidden text-left text-xs uppercase tracking-wide text-tin sm:table-header-group",
  body: "block sm:table-row-group",
  row: "flex flex-wrap items-center gap-x-4 gap-y-2 border-t border-tin-rule px-4 py-3 sm:table-row sm:p-0",
  /** The row's first cell, full width on a phone. */
  lead: "basis-full sm:table-cell sm:px-4 sm:py-2",
  cell: "sm:table-cell sm:px-4 sm:py-2",
  /** A column a phone does without. */
  wideOnly: "hidden sm:table-cell sm:px-4 sm:py-2",
} as const;

/** Words a phone shows before a value, where a wide screen has the column's header. */
export function PhoneLabel({ children }: { children: string }) {
  return <span className="text-xs text-tin sm:hidden">{children} </span>;
}
