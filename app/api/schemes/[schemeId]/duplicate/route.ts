import { duplicateScheme } from "@/db/queries/schemes";
import { route } from "@/lib/server/guard";
import { schemeParams } from "@/lib/server/params";
import { duplicateSchemeSchema } from "@/lib/spec/document";

export const POST = route({ permission: "schemes:edit", params: schemeParams, body: duplicateSchemeSchema }, async ({ user, params, body }) => {
  const scheme = await duplicateScheme({ user, schemeId: params.schemeId, name: body.name });
  return Response.json({ scheme }, { status: 201 });
});
