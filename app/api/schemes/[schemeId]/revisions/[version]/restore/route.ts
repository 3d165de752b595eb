import { restoreRevision } from "@/db/queries/schemes";
import { route } from "@/lib/server/guard";
import { restoreSchema } from "@/lib/spec/document";
import { parseVersion } from "@/lib/server/params";

export const POST = route<typeof restoreSchema, { schemeId: string; version: string }>({ permission: "schemes:edit", body: restoreSchema }, async ({ user, params, body }) => ({
  scheme: await restoreRevision({ user, schemeId: params.schemeId, version: parseVersion(params.version), basedOn: body.version }),
}));
