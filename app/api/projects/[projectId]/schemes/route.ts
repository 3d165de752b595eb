import { getProjectForUser } from "@/db/queries/projects";
import { createScheme } from "@/db/queries/schemes";
import { route } from "@/lib/server/guard";
import { DOCUMENT_BODY_LIMIT } from "@/lib/server/input";
import { projectParams } from "@/lib/server/params";
import { newSchemeSchema } from "@/lib/spec/document";

export const GET = route({ permission: "schemes:read", params: projectParams }, async ({ user, params }) => {
  const { schemes } = await getProjectForUser({ user, projectId: params.projectId });
  return { schemes };
});

export const POST = route({ permission: "schemes:edit", params: projectParams, body: newSchemeSchema, bodyLimit: DOCUMENT_BODY_LIMIT }, async ({ user, params, body }) => {
  const scheme = await createScheme({ user, projectId: params.projectId, name: body.name, description: body.description, document: body.document });
  return Response.json({ scheme }, { status: 201 });
});
