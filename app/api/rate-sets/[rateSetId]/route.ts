import { getRateSet, saveRateSetVersion } from "@/db/queries/rate-sets";
import { route } from "@/lib/server/guard";
import { rateSetParams } from "@/lib/server/params";
import { ratesFromForm } from "@/lib/server/rate-book";
import { saveRatesSchema } from "@/lib/validation/rate-sets";


export const GET = route({ permission: "rates:manage", params: rateSetParams }, async ({ params }) => getRateSet({ rateSetId: params.rateSetId }));

/** Saves the edited rates as a new version; every bad value answers 422 with its field path, and nothing is saved. */
export const PUT = route({ permission: "rates:manage", body: saveRatesSchema, params: rateSetParams }, async ({ user, params, body }) => {
  const rates = ratesFromForm(body.rates);
  const saved = await saveRateSetVersion({ user, rateSetId: params.rateSetId, basedOn: body.version, effectiveDate: body.effectiveDate, note: body.note, rates });
  return { ...(await getRateSet({ rateSetId: params.rateSetId })), savedVersion: saved.version };
});
