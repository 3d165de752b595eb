import { commitImport } from "@/db/queries/imports";
import { route } from "@/lib/server/guard";
import { importRequestSchema } from "@/lib/spec/import";

type Params = { projectId: string };

/** Imports a stop list or scheme file as a new scheme (201) or as a new revision of a draft (200). */
export const POST = route<typeof importRequestSchema, Params>({ permission: "schemes:edit", body: importRequestSchema }, async ({ user, params, body }) => {
  const scheme = await commitImport({ user, projectId: params.projectId, input: body });
  return Response.json({ scheme }, { status: body.target.kind === "new" ? 201 : 200 });
});
