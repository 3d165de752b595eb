import { getRateSet, makeRateSetCurrent } from "@/db/queries/rate-sets";
import { route } from "@/lib/server/guard";
import { rateSetParams } from "@/lib/server/params";

/** Makes this set the one schemes are priced with unless another is chosen. */
export const POST = route({ permission: "rates:manage", params: rateSetParams }, async ({ params }) => {
  await makeRateSetCurrent({ rateSetId: params.rateSetId });
  return getRateSet({ rateSetId: params.rateSetId });
});
