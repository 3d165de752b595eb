"use client";
import { errorText } from "@/components/spec/api";
import { useArchiveProject } from "@/lib/query/hooks";

export function ArchiveButton({ projectId, archived }: { projectId: string; archived: boolean }) {
  const archive = useArchiveProject(projectId);
  return (
    <div className="text-right">
      <button type="button" className="btn" disabled={archive.isPending} onClick={() => archive.mutate(!archived)}>
        {archived ? "Restore from archive" : "Archive project"}
      </button>
      {archive.error && <p role="alert" className="field-error">{errorText(archive.error, "Could not change the archive state.")}</p>}
    </div>
  );
}
