import { gateProjectPage } from "../project-gate";

// Refuses a project the user may not see before the loading skeleton streams (see project-gate.ts).
export default async function Layout({ children, params }: { children: React.ReactNode; params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  await gateProjectPage({ projectId, permission: "schemes:edit", path: `/projects/${projectId}/import` });
  return children;
}
