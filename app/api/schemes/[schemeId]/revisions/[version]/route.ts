import { getRevision } from "@/db/queries/schemes";
import { parseVersion } from "@/lib/server/params";
import { route } from "@/lib/server/guard";

export const GET = route<undefined, { schemeId: string; version: string }>({ permission: "revisions:read" }, async ({ user, params }) => ({
  revision: await getRevision({ user, schemeId: params.schemeId, version: parseVersion(params.version) }),
}));
