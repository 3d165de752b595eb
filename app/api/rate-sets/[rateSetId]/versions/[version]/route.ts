import { getRateSetVersion } from "@/db/queries/rate-sets";
import { route } from "@/lib/server/guard";
import { rateSetVersionParams } from "@/lib/server/params";

export const GET = route({ permission: "rates:manage", params: rateSetVersionParams }, async ({ params }) => ({
  version: await getRateSetVersion({ rateSetId: params.rateSetId, version: params.version }),
}));
