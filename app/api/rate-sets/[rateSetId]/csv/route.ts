import { getRateSet, getRateSetVersion } from "@/db/queries/rate-sets";
import { rateBookFields, ratesToCsv } from "@/lib/rates-book";
import { route } from "@/lib/server/guard";
import { parseVersion, rateSetParams } from "@/lib/server/params";

/** The set (its latest version, or ?version=) as a CSV file a spreadsheet opens. */
export const GET = route({ permission: "rates:manage", params: rateSetParams }, async ({ params, url }) => {
  const { set } = await getRateSet({ rateSetId: params.rateSetId });
  const v = await getRateSetVersion({ rateSetId: set.id, version: url.searchParams.get("version") ? parseVersion(url.searchParams.get("version")!) : set.version });
  const name = `${set.name.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "").toLowerCase() || "rates"}-v${v.version}.csv`;
  // A byte-order mark, so spreadsheets read the file as UTF-8 (en dashes, primes, currency signs).
  return new Response("\uFEFF" + ratesToCsv(rateBookFields, v.rates, v.effectiveDate), {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${name}"`, "cache-control": "no-store" },
  });
});
