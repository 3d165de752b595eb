import { getProjectForUser, updateProject } from "@/db/queries/projects";
import { route } from "@/lib/server/guard";
import { projectParams } from "@/lib/server/params";
import { projectPatchSchema } from "@/lib/spec/projects";

export const GET = route({ permission: "projects:read", params: projectParams }, async ({ user, params }) =>
  getProjectForUser({ user, projectId: params.projectId }),
);

export const PATCH = route({ permission: "projects:edit", params: projectParams, body: projectPatchSchema }, async ({ user, params, body }) => {
  const { project } = await updateProject({ user, projectId: params.projectId, patch: body });
  return { project };
});
