import { getComparisonForUser, parseSchemeIds } from "@/db/queries/comparison";
import { route } from "@/lib/server/guard";

/** ?schemes=id,id[,id[,id]] — the first is the one the others are compared with. Money and hours only for roles that may see them. */
export const GET = route<undefined, { projectId: string }>({ permission: "schemes:read" }, async ({ user, params, url }) => ({
  comparison: await getComparisonForUser({ user, projectId: params.projectId, schemeIds: parseSchemeIds(url.searchParams.get("schemes")) }),
}));
