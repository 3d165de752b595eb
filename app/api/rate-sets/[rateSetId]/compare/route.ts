import { getRateSet, getRateSetVersion } from "@/db/queries/rate-sets";
import { compareRates, rateBookFields } from "@/lib/rates-book";
import { route } from "@/lib/server/guard";
import { parseVersion, rateSetParams } from "@/lib/server/params";

/** Which figures changed from version ?from= to version ?to= (the latest when absent). */
export const GET = route({ permission: "rates:manage", params: rateSetParams }, async ({ params, url }) => {
  const { set } = await getRateSet({ rateSetId: params.rateSetId });
  const from = parseVersion(url.searchParams.get("from") ?? "1");
  const to = url.searchParams.get("to") ? parseVersion(url.searchParams.get("to")!) : set.version;
  const [a, b] = await Promise.all([getRateSetVersion({ rateSetId: set.id, version: from }), getRateSetVersion({ rateSetId: set.id, version: to })]);
  return { from: { version: a.version, effectiveDate: a.effectiveDate }, to: { version: b.version, effectiveDate: b.effectiveDate }, changes: compareRates(rateBookFields, a.rates, b.rates) };
});
