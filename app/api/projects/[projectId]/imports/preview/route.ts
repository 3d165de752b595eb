import { previewImport } from "@/db/queries/imports";
import { route } from "@/lib/server/guard";
import { importRequestSchema } from "@/lib/spec/import";

type Params = { projectId: string };

/** What an import would create, or every problem of the file; saves nothing. The file's text travels as JSON. */
export const POST = route<typeof importRequestSchema, Params>({ permission: "schemes:edit", body: importRequestSchema }, async ({ user, params, body }) => ({
  preview: await previewImport({ user, projectId: params.projectId, input: body }),
}));
