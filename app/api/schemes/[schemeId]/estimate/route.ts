import { getEstimateJsonForUser } from "@/db/queries/estimates";
import { route } from "@/lib/server/guard";
import { schemeParams } from "@/lib/server/params";

/** The estimate of the scheme's current version, against the firm's current rate set or the one named
 * by ?rateSet=; money only for roles with money:read. */
export const GET = route({ permission: "estimate:read", params: schemeParams }, async ({ user, params, url }) =>
  new Response(await getEstimateJsonForUser({ user, schemeId: params.schemeId, rateSetId: url.searchParams.get("rateSet") }), { headers: { "content-type": "application/json" } }),
);
