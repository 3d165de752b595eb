"use client";
import { useState, type ReactNode } from "react";
import { Dialog } from "./dialog";

/**
 * Asks before a change that is hard to take back (archive, remove, disable): the button opens a
 * dialog that says what will happen; only its own confirm button acts. Cancel, Escape and ✕ leave
 * everything as it was. The action runs in `onConfirm`; the dialog closes when it resolves, or
 * shows its error and stays open when it throws.
 */
export function ConfirmButton({
  label,
  title,
  confirmLabel,
  children,
  onConfirm,
  danger = false,
  className = "btn",
  ariaLabel,
  disabled = false,
}: {
  label: ReactNode;
  title: string;
  confirmLabel: string;
  /** What will happen, in plain words. */
  children: ReactNode;
  onConfirm: () => Promise<unknown>;
  danger?: boolean;
  className?: string;
  ariaLabel?: string;
  disabled?: boolean;
}) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <button type="button" className={className} aria-label={ariaLabel} disabled={disabled} onClick={() => setOpen(true)}>
        {label}
      </button>
      <ConfirmDialog open={open} title={title} confirmLabel={confirmLabel} danger={danger} onConfirm={onConfirm} onClose={() => setOpen(false)}>
        {children}
      </ConfirmDialog>
    </>
  );
}

export function ConfirmDialog({
  open,
  title,
  confirmLabel,
  children,
  onConfirm,
  onClose,
  danger = false,
}: {
  open: boolean;
  title: string;
  confirmLabel: string;
  children: ReactNode;
  onConfirm: () => Promise<unknown>;
  onClose: () => void;
  danger?: boolean;
}) {
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const close = () => {
    if (pending) return;
    setError(null);
    onClose();
  };
  async function confirm() {
    setPending(true);
    setError(null);
    try {
      await onConfirm();
      setPending(false);
      onClose();
    } catch (err) {
      setPending(false);
      setError(err instanceof Error && err.message ? err.message : "That did not work; nothing was changed.");
    }
  }
  return (
    <Dialog open={open} onClose={close} title={title}>
      <div className="space-y-3 text-sm" data-testid="confirm-dialog">
        <div className="space-y-2">{children}</div>
        {error && (
          <p role="alert" className="field-error">
            <span aria-hidden="true">✕ </span>
            {error}
          </p>
        )}
        <div className="flex flex-wrap gap-2 pt-1">
          <button type="button" className={danger ? "btn-danger" : "btn-primary"} disabled={pending} onClick={() => void confirm()}>
            {pending ? "Working…" : confirmLabel}
          </button>
          <button type="button" className="btn" disabled={pending} onClick={close}>
            Cancel
          </button>
        </div>
      </div>
    </Dialog>
  );
}
