"use client";
import { useState } from "react";
import { ApiError } from "@/components/spec/api";
import { ConfirmButton } from "@/components/ui/confirm";
import { useAddMember, useRemoveMember } from "@/lib/query/hooks";
import { roleLabels, type Role } from "@/lib/roles";
import type { ProjectMember } from "@/lib/spec/projects";

/** The firm's people on the project (the committee has its own panel). */
export function MembersPanel({ projectId, members, mayEdit, selfId }: { projectId: string; members: ProjectMember[]; mayEdit: boolean; selfId: string }) {
  const [email, setEmail] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const add = useAddMember(projectId);
  const remove = useRemoveMember(projectId);
  const pending = add.isPending || remove.isPending;
  const onError = (err: unknown) => setError(err instanceof ApiError ? (err.fields?.email?.join(" ") ?? err.message) : "That did not work.");

  return (
    <section className="panel self-start" aria-labelledby="members-heading">
      <h2 id="members-heading" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">The firm on this project</h2>
      <ul className="divide-y divide-tin-rule text-sm" data-testid="members">
        {members.map((m) => (
          <li key={m.id} className="flex items-center gap-3 px-4 py-2">
            <span className="min-w-0 flex-1">
              <span className="block font-medium">{m.name}{m.id === selfId && <span className="ml-1 text-xs text-tin">(you)</span>}</span>
              <span className="block truncate text-xs text-tin">{m.email} · {roleLabels[m.role as Role] ?? m.role}</span>
            </span>
            {mayEdit && m.id !== selfId && (
              <ConfirmButton
                label="Remove"
                className="btn py-1 text-xs"
                ariaLabel={`Remove ${m.name} from the project`}
                title={`Remove ${m.name} from the project?`}
                confirmLabel="Remove from the project"
                danger
                disabled={pending}
                onConfirm={async () => {
                  setError(null);
                  await remove.mutateAsync(m.id);
                  setNotice(`${m.name} was removed from the project.`);
                }}
              >
                <p><bdi className="font-semibold">{m.name}</bdi> ({roleLabels[m.role as Role] ?? m.role}) no longer sees this project or its schemes.</p>
                <p className="text-ink-soft">What they wrote stays. You can add them again by e-mail.</p>
              </ConfirmButton>
            )}
          </li>
        ))}
        {members.length === 0 && <li className="px-4 py-3 text-tin">No members yet.</li>}
      </ul>
      {notice && <p role="status" className="border-t border-tin-rule px-4 py-2 text-sm text-fit"><span aria-hidden="true">✓ </span>{notice}</p>}
      {mayEdit && (
        <form
          className="border-t border-tin-rule px-4 py-3"
          aria-label="Add a member"
          noValidate
          onSubmit={(e) => {
            e.preventDefault();
            if (!email.trim()) return setError("Give the member's e-mail.");
            setError(null);
            setNotice(null);
            add.mutate(email.trim(), { onSuccess: () => { setNotice(`${email.trim()} was added to the project.`); setEmail(""); }, onError });
          }}
        >
          <label className="label" htmlFor="member-email">Add by e-mail</label>
          <div className="flex gap-2">
            <input id="member-email" type="email" className="field" value={email} onChange={(e) => setEmail(e.target.value)} aria-invalid={!!error} placeholder="colleague@firm.example" />
            <button type="submit" className="btn-primary" disabled={pending}>Add</button>
          </div>
          {error && <p role="alert" className="field-error"><span aria-hidden="true">✕ </span>{error}</p>}
          <p className="mt-2 text-xs text-tin">For the firm&apos;s people with an account. Invite committee members by e-mail in the Committee panel.</p>
        </form>
      )}
    </section>
  );
}
