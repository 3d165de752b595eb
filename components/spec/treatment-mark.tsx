/**
 * Stopwright's own marks for what happens to a stop — where its pipes come from and what is done to
 * existing ones; always shown with the words (never the mark alone).
 */
import type { Origin, PipeWork } from "@/lib/estimate/scheme";
import { dispositionMark, dispositionText, type DispositionMark } from "./format";

/** The mark itself: its shapes are in globals.css (.mark-*), drawn in the colour of the text around it. */
export function TreatmentMark({ mark, className = "" }: { mark: DispositionMark; className?: string }) {
  const size = /(^|\s)h-/.test(className) ? "" : "h-3.5 w-3.5";
  return <span className={`mark mark-${mark} ${size} ${className}`} aria-hidden="true" data-mark={mark} />;
}

/** Mark and words together, e.g. "◐ Existing: restored, revoiced". */
export function Treatment({ stop, className = "" }: { stop: { origin: Origin; work?: readonly PipeWork[]; addedPipes?: "new" | "existing" }; className?: string }) {
  const mark = dispositionMark(stop);
  return (
    <span className={`inline-flex items-center gap-1 ${className}`} data-treatment={mark}>
      <TreatmentMark mark={mark} />
      <span className={mark === "removed" ? "line-through" : undefined}>{dispositionText(stop)}</span>
    </span>
  );
}
