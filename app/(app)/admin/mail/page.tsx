import type { Metadata } from "next";
import { listOutgoingMail } from "@/lib/mail/outbox";
import { keys } from "@/lib/query/keys";
import { Hydrate, prefetch } from "@/lib/query/server";
import { requirePageUser } from "@/lib/server/guard";
import { OutboxList } from "./outbox-list";

export const metadata: Metadata = { title: "Outgoing mail" };

/** Every message Stopwright queued, read from its own outbox (not from any mail server). */
export default async function OutgoingMailPage() {
  await requirePageUser("mail:read", "/admin/mail");
  await prefetch(keys.mail.outbox, () => listOutgoingMail());
  return (
    <div className="space-y-4">
      <div>
        <h1 className="text-3xl font-semibold">Outgoing mail</h1>
        <p className="text-ink-soft">Every message Stopwright has queued, newest first, with its delivery state. A message the mail server did not take is tried again by itself.</p>
      </div>
      <Hydrate>
        <OutboxList />
      </Hydrate>
    </div>
  );
}
