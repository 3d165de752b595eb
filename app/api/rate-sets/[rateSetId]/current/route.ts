import { getRateSet, makeRateSetCurrent } from "@/db/queries/rate-sets";
import { route } from "@/lib/server/guard";

/** Makes this set the one schemes are priced with unless another is chosen. */
export const POST = route<undefined, { rateSetId: string }>({ permission: "rates:manage" }, async ({ params }) => {
  await makeRateSetCurrent({ rateSetId: params.rateSetId });
  return getRateSet({ rateSetId: params.rateSetId });
});
