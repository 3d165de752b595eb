import { createQuotation, listQuotationsForProject } from "@/db/queries/quotations";
import { route } from "@/lib/server/guard";
import { newQuotationSchema } from "@/lib/validation/quotations";

type P = { projectId: string };

export const GET = route<undefined, P>({ permission: "projects:read" }, async ({ user, params }) => ({
  quotations: await listQuotationsForProject({ user, projectId: params.projectId }),
}));

/** A draft quotation of the scheme's current revision, priced with the current (or chosen) rate set's latest version. */
export const POST = route<typeof newQuotationSchema, P>({ permission: "quotes:issue", body: newQuotationSchema }, async ({ user, params, body }) => {
  const quotation = await createQuotation({ user, projectId: params.projectId, schemeId: body.schemeId, rateSetId: body.rateSetId ?? null });
  return Response.json({ quotation }, { status: 201 });
});
