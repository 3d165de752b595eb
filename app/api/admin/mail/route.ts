import { listOutgoingMail } from "@/lib/mail/outbox";
import { route } from "@/lib/server/guard";

export const GET = route({ permission: "mail:read" }, async () => ({ messages: await listOutgoingMail() }));
