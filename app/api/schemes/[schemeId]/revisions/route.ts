import { listRevisions } from "@/db/queries/schemes";
import { route } from "@/lib/server/guard";
import { schemeParams } from "@/lib/server/params";

export const GET = route({ permission: "revisions:read", params: schemeParams }, async ({ user, params }) => ({
  revisions: await listRevisions({ user, schemeId: params.schemeId }),
}));
