import type { ReactNode } from "react";
import { StateMark } from "./state-mark";

/** The trade's usual safety caution, deferring to local codes and licensed practice. */
export function Caution({ children, className = "" }: { children: ReactNode; className?: string }) {
  return (
    <p role="note" className={`flex gap-2 rounded border border-caution/40 bg-caution-light/60 px-3 py-2 text-xs text-ink ${className}`}>
      <StateMark kind="caution" className="mt-0.5 h-3.5 w-3.5 text-caution" />
      <span>
        <strong className="font-semibold">Caution.</strong> {children}
      </span>
    </p>
  );
}

export const leadCaution =
  "Pipe metal contains lead: cutting, soldering and handling it calls for the precautions of local regulations and licensed practice (ventilation, hygiene, no eating or drinking at the bench).";
