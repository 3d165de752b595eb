import { markQuotationSent } from "@/db/queries/quotations";
import { DOCX_TYPE, documentFileName, writeDocument } from "@/lib/documents";
import { route } from "@/lib/server/guard";
import { projectRecipients, sendTender } from "@/lib/server/notify";
import { quotationParams } from "@/lib/server/params";

/**
 * Sends the tender of an issued quotation to the project's committee by e-mail, with the Word
 * document attached, and lets its members find the tender and its price from then on. Sending again
 * (a member joined later, a message went astray) mails the same frozen tender.
 */
export const POST = route({ permission: "quotes:issue", params: quotationParams }, async ({ user, params }) => {
  const { read, project, recipients } = await markQuotationSent({
    user,
    quotationId: params.quotationId,
    recipientsOf: (projectId) => projectRecipients({ projectId, side: "committee" }),
  });
  const q = read.quotation;
  const bytes = await writeDocument("tender", q);
  const sent = await sendTender({ project, recipients, quotation: q, document: { filename: documentFileName("tender", q), contentType: DOCX_TYPE, content: bytes }, sentBy: user.name });
  return { quotation: read, sentTo: sent };
});
