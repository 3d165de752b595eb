import { restoreRevision } from "@/db/queries/schemes";
import { route } from "@/lib/server/guard";
import { revisionParams } from "@/lib/server/params";
import { restoreSchema } from "@/lib/spec/document";

export const POST = route({ permission: "schemes:edit", params: revisionParams, body: restoreSchema }, async ({ user, params, body }) => ({
  scheme: await restoreRevision({ user, schemeId: params.schemeId, version: params.version, basedOn: body.version }),
}));
