import Link from "next/link";
import { can, type Role } from "@/lib/roles";

/** The project's other pages: its survey files, and importing a stop list. */
export function ProjectLinks({ projectId, role }: { projectId: string; role: Role }) {
  return (
    <nav aria-label="Project" className="flex flex-wrap gap-2">
      {can(role, "files:read") && <Link className="btn" href={`/projects/${projectId}/files`}>Survey files</Link>}
      {can(role, "schemes:edit") && <Link className="btn" href={`/projects/${projectId}/import`}>Import a stop list</Link>}
    </nav>
  );
}
