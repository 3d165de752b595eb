import { createProject, listProjectsForUser } from "@/db/queries/projects";
import { route } from "@/lib/server/guard";
import { projectInputSchema } from "@/lib/spec/projects";

export const GET = route({ permission: "projects:read" }, async ({ user, url }) => ({
  projects: await listProjectsForUser({ user, includeArchived: url.searchParams.get("archived") === "1" }),
}));

export const POST = route({ permission: "projects:create", body: projectInputSchema }, async ({ user, body }) => {
  const { project } = await createProject({ user, input: body });
  return Response.json({ project }, { status: 201 });
});
