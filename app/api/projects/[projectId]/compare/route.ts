import { getComparisonForUser, parseSchemeIds } from "@/db/queries/comparison";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";

/** ?schemes=id,id[,id[,id]] — the first is the one the others are compared with. Money and hours only for roles that may see them. */
export const GET = route({ permission: "schemes:read", params: uuidParams("projectId") }, async ({ user, params, url }) => ({
  comparison: await getComparisonForUser({ user, projectId: params.projectId, schemeIds: parseSchemeIds(url.searchParams.get("schemes")) }),
}));
