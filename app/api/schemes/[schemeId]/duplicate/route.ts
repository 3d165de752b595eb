import { duplicateScheme } from "@/db/queries/schemes";
import { route } from "@/lib/server/guard";
import { duplicateSchemeSchema } from "@/lib/spec/document";

export const POST = route<typeof duplicateSchemeSchema, { schemeId: string }>({ permission: "schemes:edit", body: duplicateSchemeSchema }, async ({ user, params, body }) => {
  const scheme = await duplicateScheme({ user, schemeId: params.schemeId, name: body.name });
  return Response.json({ scheme }, { status: 201 });
});
