"use client";
import { useState } from "react";
import { useUsers } from "@/lib/query/hooks";
import { UserRow } from "./user-row";

/** The firm's users: a table on a wide screen, a list of cards on a phone; changes are said in one status line. */
export function UsersTable({ selfId }: { selfId: string }) {
  const users = useUsers().data ?? [];
  const [message, setMessage] = useState<{ text: string; ok: boolean } | null>(null);
  return (
    <div data-testid="users-table">
      <p role="status" className={`px-4 text-sm empty:hidden ${message?.ok === false ? "text-clash" : "text-fit"}`} data-testid="users-status">
        {message && <><span aria-hidden="true">{message.ok ? "✓ " : "✕ "}</span>{message.text}</>}
      </p>
      <div className="hidden grid-cols-[minmax(0,1fr)_minmax(0,1.2fr)_11rem_6.5rem_6.5rem] gap-x-4 px-4 py-2 text-left text-xs font-semibold uppercase tracking-wide text-tin md:grid" aria-hidden="true">
        <span>Name</span>
        <span>E-mail</span>
        <span>Role</span>
        <span>Status</span>
        <span />
      </div>
      <ul aria-label="Users">
        {users.map((u) => <UserRow key={u.id} user={u} isSelf={u.id === selfId} onDone={(text, ok = true) => setMessage({ text, ok })} />)}
      </ul>
    </div>
  );
}
