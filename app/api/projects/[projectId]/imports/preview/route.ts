import { previewImport } from "@/db/queries/imports";
import { route } from "@/lib/server/guard";
import { projectParams } from "@/lib/server/params";
import { IMPORT_MAX_CHARS, importRequestSchema } from "@/lib/spec/import";

// The file travels as a JSON string: up to 3 bytes a character once escaped, so its own limit (with its message) is met first.
const bodyLimit = IMPORT_MAX_CHARS * 3;

/** What an import would create, or every problem of the file; saves nothing. The file's text travels as JSON. */
export const POST = route({ permission: "schemes:edit", params: projectParams, body: importRequestSchema, bodyLimit }, async ({ user, params, body }) => ({
  preview: await previewImport({ user, projectId: params.projectId, input: body }),
}));
