import { getRevision } from "@/db/queries/schemes";
import { route } from "@/lib/server/guard";
import { revisionParams } from "@/lib/server/params";

export const GET = route({ permission: "revisions:read", params: revisionParams }, async ({ user, params }) => ({
  revision: await getRevision({ user, schemeId: params.schemeId, version: params.version }),
}));
