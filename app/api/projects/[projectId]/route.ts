import { getProjectForUser, updateProject } from "@/db/queries/projects";
import { route } from "@/lib/server/guard";
import { projectPatchSchema } from "@/lib/spec/projects";

type Params = { projectId: string };

export const GET = route<undefined, Params>({ permission: "projects:read" }, async ({ user, params }) =>
  getProjectForUser({ user, projectId: params.projectId }),
);

export const PATCH = route<typeof projectPatchSchema, Params>({ permission: "projects:edit", body: projectPatchSchema }, async ({ user, params, body }) => {
  const { project } = await updateProject({ user, projectId: params.projectId, patch: body });
  return { project };
});
