import { resendMail } from "@/lib/mail/outbox";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";

export const POST = route({ permission: "mail:read", params: uuidParams("mailId") }, async ({ params }) => {
  await resendMail({ mailId: params.mailId });
  return { ok: true };
});
