import { issueQuotation } from "@/db/queries/quotations";
import { route } from "@/lib/server/guard";
import { quotationParams } from "@/lib/server/params";
import { issueQuotationSchema } from "@/lib/validation/quotations";

/** Freezes the draft: its snapshot (scheme, rates, estimate, terms, totals) is taken now and never changes. */
export const POST = route({ permission: "quotes:issue", body: issueQuotationSchema, params: quotationParams }, async ({ user, params, body }) => ({
  quotation: await issueQuotation({ user, quotationId: params.quotationId, version: body.version }),
}));
