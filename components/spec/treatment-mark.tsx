/**
 * Stopwright's own marks for what happens to a stop — where its pipes come from and what is done to
 * existing ones; always shown with the words (never the mark alone).
 */
import type { Origin, PipeWork } from "@/lib/estimate/scheme";
import { dispositionMark, dispositionText, type DispositionMark } from "./format";

export function TreatmentMark({ mark, className = "" }: { mark: DispositionMark; className?: string }) {
  const stroke = { fill: "none", stroke: "currentColor", strokeWidth: 1.6 } as const;
  const size = /(^|\s)h-/.test(className) ? "" : "h-3.5 w-3.5";
  let body;
  switch (mark) {
    case "new":
      body = <circle cx="8" cy="8" r="5.5" fill="currentColor" />;
      break;
    case "retained":
      body = <circle cx="8" cy="8" r="5.2" {...stroke} />;
      break;
    case "restored":
      body = (
        <>
          <circle cx="8" cy="8" r="5.2" {...stroke} />
          <path d="M8 2.8a5.2 5.2 0 0 0 0 10.4z" fill="currentColor" />
        </>
      );
      break;
    case "revoiced":
      body = (
        <>
          <circle cx="8" cy="8" r="5.5" fill="currentColor" />
          <path d="M4.6 8.6c1-1.4 2-1.4 3.4-.4s2.4 1 3.4-.4" fill="none" stroke="#fffdf8" strokeWidth="1.4" strokeLinecap="round" />
        </>
      );
      break;
    case "relocated":
      body = (
        <>
          <path d="M2.5 8h10" {...stroke} strokeLinecap="round" />
          <path d="M9 4.5 12.8 8 9 11.5" {...stroke} strokeLinecap="round" strokeLinejoin="round" />
        </>
      );
      break;
    case "rescaled":
      body = (
        <>
          <circle cx="8" cy="8" r="5.2" {...stroke} />
          <path d="M5 10.5 8 5.5l3 5" {...stroke} strokeLinecap="round" strokeLinejoin="round" />
        </>
      );
      break;
    case "extension":
      body = (
        <>
          <circle cx="5.6" cy="8" r="3.4" {...stroke} />
          <circle cx="10.4" cy="8" r="3.4" {...stroke} />
        </>
      );
      break;
    case "borrowed":
      body = <circle cx="8" cy="8" r="5.2" {...stroke} strokeDasharray="2.2 1.8" />;
      break;
    case "prepared":
      body = <rect x="3" y="3" width="10" height="10" {...stroke} />;
      break;
    case "removed":
      body = (
        <>
          <circle cx="8" cy="8" r="5.2" {...stroke} />
          <path d="M2 14 14 2" {...stroke} strokeLinecap="round" />
        </>
      );
      break;
  }
  return (
    <svg viewBox="0 0 16 16" className={`inline-block shrink-0 ${size} ${className}`} aria-hidden="true" focusable="false">
      {body}
    </svg>
  );
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
