"use client";
import { useState } from "react";
import { ConfirmButton } from "@/components/ui/confirm";
import { errorText } from "@/components/spec/api";
import { useArchiveProject } from "@/lib/query/hooks";

/** Archiving asks first (the project leaves the list and stops taking changes); restoring does not. */
export function ArchiveButton({ projectId, projectName, archived }: { projectId: string; projectName: string; archived: boolean }) {
  const archive = useArchiveProject(projectId);
  const [done, setDone] = useState<string | null>(null);
  return (
    <div className="text-right">
      {archived ? (
        <button type="button" className="btn" disabled={archive.isPending} onClick={() => archive.mutate(false, { onSuccess: () => setDone("Restored from the archive.") })}>
          Restore from archive
        </button>
      ) : (
        <ConfirmButton
          label="Archive project"
          title={`Archive ${projectName}?`}
          confirmLabel="Archive the project"
          danger
          disabled={archive.isPending}
          onConfirm={async () => {
            await archive.mutateAsync(true);
            setDone("Archived. Tick “Show archived” on Projects to find it.");
          }}
        >
          <p>The project leaves the list of current projects and takes no more changes: its schemes, committee and files are kept as they are.</p>
          <p className="text-ink-soft">You can restore it from the archive at any time.</p>
        </ConfirmButton>
      )}
      {done && !archive.error && <p role="status" className="mt-1 text-xs text-fit"><span aria-hidden="true">✓ </span>{done}</p>}
      {archive.error && <p role="alert" className="field-error">{errorText(archive.error, "Could not change the archive state.")}</p>}
    </div>
  );
}
