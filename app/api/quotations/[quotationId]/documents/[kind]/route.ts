import { getQuotationForDocument } from "@/db/queries/quotations";
import { DOCX_TYPE, documentFileName, writeDocument } from "@/lib/documents";
import { documentKinds, mayDownload, type DocumentKind } from "@/lib/quote/access";
import { AppError } from "@/lib/server/errors";
import { route } from "@/lib/server/guard";
import { quotationDocumentParams } from "@/lib/server/params";

/**
 * A quotation's document as .docx. The project decides who may see the quotation at all (404
 * otherwise); the role and whether the tender was sent decide which document: the cost sheet never
 * reaches the workshop or a client, and a client gets only a tender that was sent to them.
 */
export const GET = route({ permission: "projects:read", params: quotationDocumentParams }, async ({ user, params }) => {
  if (!(documentKinds as readonly string[]).includes(params.kind)) throw new AppError("not_found", "No such document.");
  const kind = params.kind as DocumentKind;
  const { read, sent } = await getQuotationForDocument({ user, quotationId: params.quotationId });
  if (!mayDownload(user.role, kind, sent)) throw new AppError("forbidden", "Your role may not have this document.");
  const bytes = await writeDocument(kind, read.quotation);
  return new Response(new Uint8Array(bytes), {
    headers: {
      "content-type": DOCX_TYPE,
      "content-disposition": `attachment; filename="${documentFileName(kind, read.quotation)}"`,
      "cache-control": "private, no-store",
    },
  });
});
