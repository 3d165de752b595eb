import { listRevisions } from "@/db/queries/schemes";
import { route } from "@/lib/server/guard";

export const GET = route<undefined, { schemeId: string }>({ permission: "revisions:read" }, async ({ user, params }) => ({
  revisions: await listRevisions({ user, schemeId: params.schemeId }),
}));
