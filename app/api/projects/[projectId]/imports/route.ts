import { commitImport } from "@/db/queries/imports";
import { route } from "@/lib/server/guard";
import { projectParams } from "@/lib/server/params";
import { IMPORT_MAX_CHARS, importRequestSchema } from "@/lib/spec/import";

// The file travels as a JSON string: up to 3 bytes a character once escaped, so its own limit (with its message) is met first.
const bodyLimit = IMPORT_MAX_CHARS * 3;

/** Imports a stop list or scheme file as a new scheme (201) or as a new revision of a draft (200). */
export const POST = route({ permission: "schemes:edit", params: projectParams, body: importRequestSchema, bodyLimit }, async ({ user, params, body }) => {
  const scheme = await commitImport({ user, projectId: params.projectId, input: body });
  return Response.json({ scheme }, { status: body.target.kind === "new" ? 201 : 200 });
});
