import { resendMail } from "@/lib/mail/outbox";
import { route } from "@/lib/server/guard";

export const POST = route<undefined, { mailId: string }>({ permission: "mail:read" }, async ({ params }) => {
  await resendMail({ mailId: params.mailId });
  return { ok: true };
});
