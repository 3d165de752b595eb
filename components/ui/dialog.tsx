"use client";
import { useEffect, useRef, type ReactNode } from "react";

/** A modal on the native <dialog>: focus stays inside, Escape closes, focus returns where it was. */
export function Dialog({ open, onClose, title, children, wide = false }: { open: boolean; onClose: () => void; title: string; children: ReactNode; wide?: boolean }) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    if (open && !el.open) el.showModal();
    if (!open && el.open) el.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      onClose={onClose}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      aria-labelledby="dialog-title"
      className={`m-auto max-h-[92vh] w-[calc(100%-2rem)] overflow-y-auto rounded-md border border-tin-rule bg-paper-card p-0 text-ink shadow-xl backdrop:bg-ink/40 ${wide ? "max-w-3xl" : "max-w-xl"}`}
    >
      {open && (
        <div>
          <div className="flex items-center border-b border-tin-rule px-4 py-2.5">
            <h2 id="dialog-title" className="flex-1 text-lg font-semibold">{title}</h2>
            <button type="button" className="btn px-2 py-0.5" onClick={onClose} aria-label="Close">✕</button>
          </div>
          <div className="p-4">{children}</div>
        </div>
      )}
    </dialog>
  );
}
