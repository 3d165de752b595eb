import type { ReactNode } from "react";
import { FieldError } from "@/components/ui/field-error";

/** Label, input and its error in one place, for the rate book, firm and quotation forms. */
export function Field({ id, label, error, hint, className = "", children }: { id: string; label: ReactNode; error?: string; hint?: string; className?: string; children: ReactNode }) {
  return (
    <div className={className}>
      <label className="label" htmlFor={id}>{label}</label>
      {children}
      {hint && !error && <p className="mt-1 text-xs text-tin">{hint}</p>}
      <FieldError id={`${id}-error`} error={error} />
    </div>
  );
}
