import { getRateSetVersion } from "@/db/queries/rate-sets";
import { route } from "@/lib/server/guard";
import { parseVersion } from "@/lib/server/params";

export const GET = route<undefined, { rateSetId: string; version: string }>({ permission: "rates:manage" }, async ({ params }) => ({
  version: await getRateSetVersion({ rateSetId: params.rateSetId, version: parseVersion(params.version) }),
}));
