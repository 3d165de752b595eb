import { getSchemeForUser } from "@/db/queries/schemes";
import { can } from "@/lib/roles";
import { AppError } from "@/lib/server/errors";
import { route } from "@/lib/server/guard";
import { firmRates } from "@/lib/server/rates";
import { estimateDocument, withoutMoney } from "@/lib/spec/estimate";

/** The saved scheme's estimate, against the firm's current rate set or the one named by ?rateSet=. */
export const GET = route<undefined, { schemeId: string }>({ permission: "estimate:read" }, async ({ user, params, url }) => {
  const scheme = await getSchemeForUser({ user, schemeId: params.schemeId });
  const rateSetId = url.searchParams.get("rateSet");
  const result = estimateDocument(scheme.document, scheme.tuning, await firmRates({ rateSetId }));
  if (!result.ok) throw new AppError("invalid", "This scheme cannot be estimated yet.", { document: [...result.messages] });
  return { version: scheme.version, estimate: can(user.role, "money:read") ? result.estimate : withoutMoney(result.estimate) };
});
