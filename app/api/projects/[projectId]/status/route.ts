import { setProjectStatus } from "@/db/queries/projects";
import { route } from "@/lib/server/guard";
import { projectParams } from "@/lib/server/params";
import { projectStatusSchema } from "@/lib/spec/projects";

/** Where the project stands; the estimator may set it without the right to edit the other details. */
export const PUT = route({ permission: "projects:status", params: projectParams, body: projectStatusSchema }, async ({ user, params, body }) => {
  const { project } = await setProjectStatus({ user, projectId: params.projectId, status: body.status });
  return { project };
});
