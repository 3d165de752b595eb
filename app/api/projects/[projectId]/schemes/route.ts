import { getProjectForUser } from "@/db/queries/projects";
import { createScheme } from "@/db/queries/schemes";
import { route } from "@/lib/server/guard";
import { newSchemeSchema } from "@/lib/spec/document";

type Params = { projectId: string };

export const GET = route<undefined, Params>({ permission: "schemes:read" }, async ({ user, params }) => {
  const { schemes } = await getProjectForUser({ user, projectId: params.projectId });
  return { schemes };
});

export const POST = route<typeof newSchemeSchema, Params>({ permission: "schemes:edit", body: newSchemeSchema }, async ({ user, params, body }) => {
  const scheme = await createScheme({ user, projectId: params.projectId, name: body.name, description: body.description, document: body.document });
  return Response.json({ scheme }, { status: 201 });
});
