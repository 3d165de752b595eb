"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { ApiError, errorText } from "@/components/spec/api";
import { formatDate, formatDateTime } from "@/components/spec/format";
import { applyServerErrors } from "@/components/ui/server-errors";
import { ConfirmButton } from "@/components/ui/confirm";
import { useInvitations, useInvite, useRemoveCommitteeMember, useResendInvitation, useWithdrawInvitation } from "@/lib/query/hooks";
import { inviteSchema, type InvitationState } from "@/lib/spec/committee";
import type { ProjectMember } from "@/lib/spec/projects";
import { FieldError } from "@/components/ui/field-error";

const stateWords: Record<InvitationState, string> = { pending: "◷ Waiting", expired: "⌛ Expired", accepted: "✓ Accepted", withdrawn: "✕ Withdrawn" };

function InviteForm({ projectId, onDone }: { projectId: string; onDone: (text: string) => void }) {
  const invite = useInvite(projectId);
  const [notice, setNotice] = useState<string | null>(null);
  const form = useForm<z.input<typeof inviteSchema>, unknown, z.output<typeof inviteSchema>>({ resolver: zodResolver(inviteSchema), defaultValues: { email: "", name: "" } });
  const err = form.formState.errors;
  const onSubmit = form.handleSubmit((values) => {
    setNotice(null);
    invite.mutate(values, {
      onSuccess: (res) => {
        form.reset();
        onDone(res.kind === "added" ? `${res.member.name} already had an account and was added to the committee.` : `Invitation sent to ${values.email}.`);
      },
      onError: (e) => {
        const rest = e instanceof ApiError ? applyServerErrors(form.setError, e.fields, ["email", "name"]) : [];
        setNotice(rest.length ? rest.join(" ") : e instanceof ApiError && !e.fields ? e.message : null);
      },
    });
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Invite a committee member" className="space-y-2 border-t border-tin-rule px-4 py-3">
      <div className="grid gap-2 sm:grid-cols-2">
        <div>
          <label className="label" htmlFor="invite-name">Name</label>
          <input id="invite-name" className="field" aria-invalid={!!err.name} {...form.register("name")} placeholder="e.g. Canon Ada Example" />
          <FieldError error={err.name} />
        </div>
        <div>
          <label className="label" htmlFor="invite-email">E-mail</label>
          <input id="invite-email" type="email" className="field" aria-invalid={!!err.email} {...form.register("email")} placeholder="name@parish.example" />
          <FieldError error={err.email} />
        </div>
      </div>
      <button type="submit" className="btn-primary" disabled={invite.isPending}>{invite.isPending ? "Sending…" : "Send invitation"}</button>
      {notice && <p role="alert" className="field-error">✕ {notice}</p>}
      <p className="text-xs text-tin">The link works once, for 14 days. Committee members see only the schemes shared with them, never rates, hours or margins.</p>
    </form>
  );
}

/** The client's committee: its members, the invitations out, and a form to invite someone. */
export function CommitteePanel({ projectId, members }: { projectId: string; members: ProjectMember[] }) {
  const invitations = useInvitations(projectId);
  const resend = useResendInvitation(projectId);
  const withdraw = useWithdrawInvitation(projectId);
  const remove = useRemoveCommitteeMember(projectId);
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const committee = members.filter((m) => m.role === "client");
  const open = (invitations.data ?? []).filter((i) => i.state !== "accepted");
  const fail = (e: unknown) => setNotice({ ok: false, text: errorText(e) });
  return (
    <section className="panel self-start" aria-labelledby="committee-heading" data-testid="committee-panel">
      <h2 id="committee-heading" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">Committee</h2>
      <ul className="divide-y divide-tin-rule text-sm" data-testid="committee-members">
        {committee.map((m) => (
          <li key={m.id} className="flex items-center gap-3 px-4 py-2">
            <span className="min-w-0 flex-1">
              <span className="block font-medium">{m.name}</span>
              <span className="block truncate text-xs text-tin">{m.email}</span>
            </span>
            <ConfirmButton
              label="Remove"
              className="btn py-1 text-xs"
              ariaLabel={`Remove ${m.name} from the committee`}
              title={`Remove ${m.name} from the committee?`}
              confirmLabel="Remove from the committee"
              danger
              disabled={remove.isPending}
              onConfirm={async () => {
                await remove.mutateAsync(m.id);
                setNotice({ ok: true, text: `${m.name} was removed from the committee.` });
              }}
            >
              <p><bdi className="font-semibold">{m.name}</bdi> no longer sees this project&apos;s schemes, comments or files, and is not told of new ones.</p>
              <p className="text-ink-soft">Their comments and preference stay in the record. You can invite them again later.</p>
            </ConfirmButton>
          </li>
        ))}
        {committee.length === 0 && <li className="px-4 py-3 text-tin">No committee members yet.</li>}
      </ul>
      {open.length > 0 && (
        <div className="border-t border-tin-rule px-4 py-2">
          <h3 className="label">Invitations</h3>
          <ul className="space-y-2 text-sm" data-testid="invitations">
            {open.map((i) => (
              <li key={i.id} className="flex flex-wrap items-center gap-2" data-testid={`invitation-${i.email}`} data-state={i.state}>
                <span className="min-w-0 flex-1">
                  <span className="block font-medium">{i.name} <span className="font-normal text-tin">{i.email}</span></span>
                  <span className="block text-xs text-tin">
                    {stateWords[i.state]} · sent {formatDateTime(i.sentAt)}{i.invitedByName && ` by ${i.invitedByName}`}
                    {i.state === "pending" && ` · good until ${formatDate(i.expiresAt)}`}
                  </span>
                </span>
                <button type="button" className="btn py-1 text-xs" disabled={resend.isPending} aria-label={`Send the invitation to ${i.email} again`}
                  onClick={() => resend.mutate(i.id, { onSuccess: () => setNotice({ ok: true, text: `A new link was sent to ${i.email}; the old one no longer works.` }), onError: fail })}>
                  Send again
                </button>
                {i.state === "pending" && (
                  <ConfirmButton
                    label="Withdraw"
                    className="btn py-1 text-xs"
                    ariaLabel={`Withdraw the invitation to ${i.email}`}
                    title="Withdraw the invitation?"
                    confirmLabel="Withdraw the invitation"
                    danger
                    disabled={withdraw.isPending}
                    onConfirm={async () => {
                      await withdraw.mutateAsync(i.id);
                      setNotice({ ok: true, text: `The invitation to ${i.email} was withdrawn.` });
                    }}
                  >
                    <p>The link sent to <span className="font-semibold">{i.email}</span> stops working at once. You can invite them again later.</p>
                  </ConfirmButton>
                )}
              </li>
            ))}
          </ul>
        </div>
      )}
      {notice && <p role={notice.ok ? "status" : "alert"} className={`px-4 py-2 text-sm ${notice.ok ? "text-fit" : "text-clash"}`}>{notice.ok ? "✓ " : "✕ "}{notice.text}</p>}
      <InviteForm projectId={projectId} onDone={(text) => setNotice({ ok: true, text })} />
    </section>
  );
}
