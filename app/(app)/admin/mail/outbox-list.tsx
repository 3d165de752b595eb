"use client";
import { errorText } from "@/components/spec/api";
import { formatDateTime } from "@/components/spec/format";
import { StateMark } from "@/components/ui/state-mark";
import { useOutbox, useResendMail } from "@/lib/query/hooks";
import type { OutboxMessage } from "@/lib/mail/types";

const kindLabels: Record<string, string> = {
  invitation: "Invitation",
  "committee-added": "Added to a committee",
  "scheme-shared": "Scheme shared",
  comment: "New comment",
  tender: "Tender sent",
};

function Status({ m }: { m: OutboxMessage }) {
  if (m.status === "sent") return <span className="inline-flex items-center gap-1 text-fit"><StateMark kind="fit" />Sent {m.sentAt && formatDateTime(m.sentAt)}</span>;
  if (m.status === "failed") return <span className="inline-flex items-center gap-1 font-semibold text-clash"><StateMark kind="clash" />Failed after {m.attempts} tries</span>;
  return (
    <span className="inline-flex items-center gap-1 text-caution">
      <StateMark kind="saving" />{m.attempts ? `Waiting to retry (${m.attempts} ${m.attempts === 1 ? "try" : "tries"} so far)` : "Queued"}
    </span>
  );
}

export function OutboxList() {
  const outbox = useOutbox();
  const resend = useResendMail();
  const messages = outbox.data ?? [];
  if (!messages.length) return <p className="panel px-4 py-3 text-sm text-tin">Nothing has been sent yet.</p>;
  return (
    <ul className="space-y-3" data-testid="outbox">
      {messages.map((m) => (
        <li key={m.id} className="panel" data-testid="outbox-message" data-kind={m.kind} data-status={m.status}>
          <details>
            <summary className="flex cursor-pointer flex-wrap items-baseline gap-x-4 gap-y-1 px-4 py-3">
              <span className="min-w-0 basis-full sm:basis-auto sm:flex-1">
                <span className="block font-semibold">{m.subject}</span>
                <span className="block break-words text-xs text-tin sm:truncate">To {m.to.join(", ")} · {kindLabels[m.kind] ?? m.kind} · {formatDateTime(m.createdAt)}</span>
              </span>
              <span className="text-xs"><Status m={m} /></span>
            </summary>
            <div className="space-y-3 border-t border-tin-rule px-4 py-3 text-sm">
              {m.lastError && <p className="text-clash">Last error: {m.lastError}</p>}
              {m.status === "failed" && (
                <button type="button" className="btn" disabled={resend.isPending} onClick={() => resend.mutate(m.id)}>Send again</button>
              )}
              {resend.error && resend.variables === m.id && <p role="alert" className="field-error">✕ {errorText(resend.error)}</p>}
              {m.links.length > 0 && (
                <div>
                  <h3 className="label">Links in this message</h3>
                  <ul className="space-y-1">
                    {m.links.map((l) => (
                      <li key={l.url}><a className="break-all text-brass-dark underline" href={l.url} data-testid="outbox-link">{l.label}</a> <span className="break-all text-xs text-tin">{l.url}</span></li>
                    ))}
                  </ul>
                </div>
              )}
              {m.attachments.length > 0 && (
                <div>
                  <h3 className="label">Attachments</h3>
                  <ul>
                    {m.attachments.map((a) => (
                      <li key={a.id}><a className="underline" href={`/api/admin/mail/${m.id}/attachments/${a.id}`} download={a.filename}>{a.filename}</a> <span className="text-xs text-tin">{a.contentType}, {Math.ceil(a.sizeBytes / 1024)} KB</span></li>
                    ))}
                  </ul>
                </div>
              )}
              <pre className="whitespace-pre-wrap rounded border border-tin-rule bg-paper p-3 font-sans text-sm">{m.text}</pre>
            </div>
          </details>
        </li>
      ))}
    </ul>
  );
}
