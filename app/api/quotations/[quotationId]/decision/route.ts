import { decideQuotation } from "@/db/queries/quotations";
import { route } from "@/lib/server/guard";
import { decisionSchema } from "@/lib/validation/quotations";

export const POST = route<typeof decisionSchema, { quotationId: string }>({ permission: "quotes:issue", body: decisionSchema }, async ({ user, params, body }) => ({
  quotation: await decideQuotation({ user, quotationId: params.quotationId, outcome: body.outcome }),
}));
