"use client";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { api, ApiError } from "@/components/spec/api";

export function ArchiveButton({ projectId, archived }: { projectId: string; archived: boolean }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  return (
    <div className="text-right">
      <button
        type="button"
        className="btn"
        disabled={pending}
        onClick={() =>
          startTransition(async () => {
            setError(null);
            try {
              await api.archiveProject(projectId, !archived);
              router.refresh();
            } catch (err) {
              setError(err instanceof ApiError ? err.message : "Could not change the archive state.");
            }
          })
        }
      >
        {archived ? "Restore from archive" : "Archive project"}
      </button>
      {error && <p role="alert" className="field-error">{error}</p>}
    </div>
  );
}
