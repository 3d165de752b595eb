import { getRateSet, getRateSetVersion, saveRateSetVersion } from "@/db/queries/rate-sets";
import { rateBookFromCsv } from "@/lib/rates-book";
import { AppError } from "@/lib/server/errors";
import { route } from "@/lib/server/guard";
import { rateSetParams } from "@/lib/server/params";
import { importRatesSchema } from "@/lib/validation/rate-sets";

/**
 * A CSV file checked against the rate book (the file's text sent inside a JSON body, so the usual
 * origin and content-type checks hold). Without `commit` it answers a preview: every row with its old
 * and new value and its problems. With `commit` it saves a new version only when every row is good;
 * a bad file answers 422 with the same preview and saves nothing.
 */
export const POST = route({ permission: "rates:manage", body: importRatesSchema, params: rateSetParams }, async ({ user, params, body }) => {
  const { set } = await getRateSet({ rateSetId: params.rateSetId });
  const base = await getRateSetVersion({ rateSetId: set.id, version: set.version });
  const result = rateBookFromCsv(body.csv, base.rates);
  const preview = { ok: result.ok, rows: result.rows, fileProblems: result.fileProblems, effectiveDate: result.effectiveDate, changedCount: result.changedCount };
  if (!body.commit) return { preview };
  if (!result.ok) {
    const fields: Record<string, string[]> = {};
    for (const r of result.rows) if (r.problems.length) fields[`csv.row.${r.row}`] = [...r.problems];
    if (result.fileProblems.length) fields.csv = [...result.fileProblems];
    throw new AppError("invalid", "The file has problems; nothing was saved.", fields, { preview });
  }
  const saved = await saveRateSetVersion({
    user, rateSetId: set.id, basedOn: body.version, effectiveDate: result.effectiveDate ?? base.effectiveDate,
    note: body.note || `imported from a CSV file (${result.changedCount} ${result.changedCount === 1 ? "change" : "changes"})`, rates: result.rates,
  });
  return { preview, savedVersion: saved.version };
});
