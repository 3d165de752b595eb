/** Marks for states, so no state rests on colour alone: each is drawn with its word beside it. */
export type StateKind = "fit" | "clash" | "caution" | "saved" | "saving" | "unsaved" | "unknown";

export function StateMark({ kind, className = "" }: { kind: StateKind; className?: string }) {
  const size = /(^|\s)h-/.test(className) ? "" : "h-3.5 w-3.5";
  const s = { fill: "none", stroke: "currentColor", strokeWidth: 1.8, strokeLinecap: "round", strokeLinejoin: "round" } as const;
  let body;
  switch (kind) {
    case "fit":
    case "saved":
      body = <path d="M3 8.5 6.5 12 13 4.5" {...s} />;
      break;
    case "clash":
      body = (
        <>
          <circle cx="8" cy="8" r="6" fill="currentColor" />
          <path d="M5.5 5.5l5 5M10.5 5.5l-5 5" stroke="#fffdf8" strokeWidth="1.8" strokeLinecap="round" />
        </>
      );
      break;
    case "caution":
      body = (
        <>
          <path d="M8 1.8 14.6 13.6H1.4z" fill="currentColor" />
          <path d="M8 6v3.6" stroke="#fffdf8" strokeWidth="1.6" strokeLinecap="round" />
          <circle cx="8" cy="11.6" r="0.9" fill="#fffdf8" />
        </>
      );
      break;
    case "saving":
      body = <path d="M8 2.5a5.5 5.5 0 1 1-5.5 5.5" {...s} />;
      break;
    case "unsaved":
      body = <circle cx="8" cy="8" r="4" fill="currentColor" />;
      break;
    case "unknown":
      body = <circle cx="8" cy="8" r="5.2" {...s} strokeDasharray="2 2" />;
      break;
  }
  return (
    <svg viewBox="0 0 16 16" className={`inline-block shrink-0 ${size} ${kind === "saving" ? "motion-safe:animate-spin" : ""} ${className}`} aria-hidden="true" focusable="false">
      {body}
    </svg>
  );
}
