import { getSchemeForUser } from "@/db/queries/schemes";
import { can } from "@/lib/roles";
import { AppError } from "@/lib/server/errors";
import { route } from "@/lib/server/guard";
import { firmRates } from "@/lib/server/rates";
import { estimateDocument, withoutMoney } from "@/lib/spec/estimate";

export const GET = route<undefined, { schemeId: string }>({ permission: "estimate:read" }, async ({ user, params }) => {
  const scheme = await getSchemeForUser({ user, schemeId: params.schemeId });
  const result = estimateDocument(scheme.document, scheme.tuning, firmRates());
  if (!result.ok) throw new AppError("invalid", "This scheme cannot be estimated yet.", { document: [...result.messages] });
  return { version: scheme.version, estimate: can(user.role, "money:read") ? result.estimate : withoutMoney(result.estimate) };
});
