import { StateMark } from "@/components/ui/state-mark";
import type { SaveState } from "./use-scheme-save";

const words: Record<SaveState["kind"], string> = {
  saved: "Saved",
  unsaved: "Unsaved changes",
  saving: "Saving…",
  conflict: "Conflict",
  invalid: "Not saved: see the messages",
  error: "Not saved: offline?",
};

export function SaveStateBadge({ state, version }: { state: SaveState; version: number }) {
  const kind = state.kind;
  const mark = kind === "saved" ? "saved" : kind === "saving" ? "saving" : kind === "unsaved" ? "unsaved" : kind === "conflict" ? "caution" : "clash";
  const colour = kind === "saved" ? "text-fit" : kind === "saving" || kind === "unsaved" ? "text-caution" : "text-clash";
  return (
    <span className={`inline-flex items-center gap-1.5 text-sm font-medium ${colour}`} data-testid="save-state" data-state={kind} role="status" aria-live="polite">
      <StateMark kind={mark} />
      {words[kind]}
      {kind === "saved" && <span className="num font-normal text-tin">v{version}</span>}
    </span>
  );
}
