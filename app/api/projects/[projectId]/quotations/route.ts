import { createQuotation, listQuotationsForProject } from "@/db/queries/quotations";
import { route } from "@/lib/server/guard";
import { projectParams } from "@/lib/server/params";
import { newQuotationSchema } from "@/lib/validation/quotations";


export const GET = route({ permission: "projects:read", params: projectParams }, async ({ user, params }) => ({
  quotations: await listQuotationsForProject({ user, projectId: params.projectId }),
}));

/** A draft quotation of the scheme's current revision, priced with the current (or chosen) rate set's latest version. */
export const POST = route({ permission: "quotes:issue", body: newQuotationSchema, params: projectParams }, async ({ user, params, body }) => {
  const quotation = await createQuotation({ user, projectId: params.projectId, schemeId: body.schemeId, rateSetId: body.rateSetId ?? null });
  return Response.json({ quotation }, { status: 201 });
});
