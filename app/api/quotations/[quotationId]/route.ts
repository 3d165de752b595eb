import { getQuotationForUser, saveCommercial } from "@/db/queries/quotations";
import { mayReadQuotation } from "@/lib/quote/access";
import { AppError } from "@/lib/server/errors";
import { route } from "@/lib/server/guard";
import { quotationParams } from "@/lib/server/params";
import { saveQuotationSchema } from "@/lib/validation/quotations";


export const GET = route({ permission: "projects:read", params: quotationParams }, async ({ user, params }) => {
  // Prices are for the firm's money roles; others find only what the list and the documents give them.
  if (!mayReadQuotation(user.role)) throw new AppError("not_found", "No such quotation.");
  return { quotation: await getQuotationForUser({ user, quotationId: params.quotationId }) };
});

export const PUT = route({ permission: "quotes:issue", body: saveQuotationSchema, params: quotationParams }, async ({ user, params, body }) => ({
  quotation: await saveCommercial({ user, quotationId: params.quotationId, version: body.version, commercial: body.commercial }),
}));
