import { getMailAttachment } from "@/lib/mail/outbox";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";

/** An attachment as it was sent, for the administrator to download. */
export const GET = route({ permission: "mail:read", params: uuidParams("mailId", "attachmentId") }, async ({ params }) => {
  const file = await getMailAttachment(params);
  return new Response(new Uint8Array(file.content), {
    headers: {
      "content-type": file.contentType,
      "content-length": String(file.sizeBytes),
      "content-disposition": `attachment; filename*=UTF-8''${encodeURIComponent(file.filename)}`,
      "x-content-type-options": "nosniff",
    },
  });
});
