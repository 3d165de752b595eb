import { decideQuotation } from "@/db/queries/quotations";
import { route } from "@/lib/server/guard";
import { quotationParams } from "@/lib/server/params";
import { decisionSchema } from "@/lib/validation/quotations";

export const POST = route({ permission: "quotes:issue", body: decisionSchema, params: quotationParams }, async ({ user, params, body }) => ({
  quotation: await decideQuotation({ user, quotationId: params.quotationId, outcome: body.outcome }),
}));
