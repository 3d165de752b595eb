import { StateMark, type StateKind } from "@/components/ui/state-mark";
import { quoteStatusLabels, type QuoteStatus } from "@/lib/quote/quotation";

const marks: Record<QuoteStatus, { kind: StateKind; cls: string }> = {
  draft: { kind: "unsaved", cls: "text-tin" },
  issued: { kind: "saved", cls: "text-brass-dark" },
  accepted: { kind: "fit", cls: "text-fit" },
  declined: { kind: "clash", cls: "text-clash" },
  lapsed: { kind: "caution", cls: "text-caution" },
};

/** A quotation's state as a word and a mark, never colour alone. */
export function QuoteStatusBadge({ status }: { status: QuoteStatus }) {
  const m = marks[status];
  return (
    <span className={`inline-flex items-center gap-1 text-sm font-medium ${m.cls}`} data-testid="quote-status" data-status={status}>
      <StateMark kind={m.kind} />{quoteStatusLabels[status]}
    </span>
  );
}
