import { getChangeCostsForUser, parseSchemeIds } from "@/db/queries/comparison";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";

/** What each stop change is worth on its own (one estimate per change, so asked for after the comparison). */
export const GET = route({ permission: "money:read", params: uuidParams("projectId") }, async ({ user, params, url }) => ({
  costs: await getChangeCostsForUser({ user, projectId: params.projectId, schemeIds: parseSchemeIds(url.searchParams.get("schemes")) }),
}));
