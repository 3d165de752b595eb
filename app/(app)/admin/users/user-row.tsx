"use client";
import { useState } from "react";
import type { UserRow as Row } from "@/components/spec/api";
import { ConfirmButton, ConfirmDialog } from "@/components/ui/confirm";
import { roleLabels, roles, type Role } from "@/lib/roles";
import { useChangeUser } from "./hooks";

/** What a role may do, in a line, so the administrator knows what a change of role gives or takes. */
const roleReach: Record<Role, string> = {
  admin: "manage users and the firm's settings, and see every project, figure and price",
  designer: "create projects and edit schemes, with figures and prices",
  estimator: "price schemes, set a project's status and see every figure and price, but not edit schemes",
  workshop: "read schemes, figures and hours, without prices, and add survey files and notes",
  client: "see only the schemes shared with the committees they sit on, never prices or hours",
};

/**
 * One user, as a row of the table on a wide screen and a card on a phone. A change of role or
 * disabling asks first (the person's sessions end at once) and says when it is done.
 */
export function UserRow({ user, isSelf, onDone }: { user: Row; isSelf: boolean; onDone: (message: string, ok?: boolean) => void }) {
  const mutation = useChangeUser();
  const [role, setRole] = useState<Role | null>(null);
  const change = (change: { role?: Role; disabled?: boolean }) => mutation.mutateAsync({ id: user.id, change });

  return (
    <li
      className="grid gap-x-4 gap-y-1 border-t border-tin-rule px-4 py-3 text-sm md:grid-cols-[minmax(0,1fr)_minmax(0,1.2fr)_11rem_6.5rem_6.5rem] md:items-center md:py-2"
      data-testid={`user-${user.email}`}
    >
      <span className="font-medium">
        <bdi>{user.name}</bdi>
        {isSelf && <span className="ml-1 text-xs text-tin">(you)</span>}
      </span>
      <span className="break-all text-ink-soft md:break-normal md:truncate" title={user.email}>{user.email}</span>
      <span className="flex items-center gap-2">
        <label className="text-xs text-tin md:sr-only" htmlFor={`role-${user.id}`}>Role</label>
        <select
          id={`role-${user.id}`}
          aria-label={`Role of ${user.name}`}
          className="field w-auto min-w-[10.5rem] py-1 md:w-full md:min-w-0"
          value={role ?? user.role}
          disabled={mutation.isPending || isSelf}
          title={isSelf ? "You cannot change your own role." : undefined}
          onChange={(e) => setRole(e.target.value as Role)}
        >
          {roles.map((r) => <option key={r} value={r}>{roleLabels[r]}</option>)}
        </select>
      </span>
      <span>
        {user.disabled ? (
          <span className="text-clash"><span aria-hidden="true">■ </span>Disabled</span>
        ) : (
          <span className="text-fit"><span aria-hidden="true">● </span>Active</span>
        )}
      </span>
      <span className="md:text-right">
        {!isSelf &&
          (user.disabled ? (
            <button
              type="button"
              className="btn"
              disabled={mutation.isPending}
              onClick={() => mutation.mutate({ id: user.id, change: { disabled: false } }, { onSuccess: () => onDone(`${user.name} can sign in again.`), onError: (err) => onDone(err.message, false) })}
            >
              Enable
            </button>
          ) : (
            <ConfirmButton
              label="Disable"
              ariaLabel={`Disable ${user.name}`}
              title={`Disable ${user.name}?`}
              confirmLabel="Disable the account"
              danger
              disabled={mutation.isPending}
              onConfirm={async () => {
                await change({ disabled: true });
                onDone(`${user.name} is disabled and signed out.`);
              }}
            >
              <p>
                <bdi className="font-semibold">{user.name}</bdi> ({user.email}) is signed out at once and cannot sign in until an administrator enables the account again.
              </p>
              <p className="text-ink-soft">Their projects, schemes, comments and notes stay as they are.</p>
            </ConfirmButton>
          ))}
      </span>
      <ConfirmDialog
        open={role !== null && role !== user.role}
        title={`Change ${user.name}'s role?`}
        confirmLabel={`Make ${role ? roleLabels[role] : ""}`}
        onClose={() => setRole(null)}
        onConfirm={async () => {
          if (!role) return;
          await change({ role });
          onDone(`${user.name} is now ${article(roleLabels[role])} ${roleLabels[role]}.`);
        }}
      >
        <p>
          <bdi className="font-semibold">{user.name}</bdi> goes from {roleLabels[user.role]} to <strong>{role ? roleLabels[role] : ""}</strong>, and is signed out at once to sign in again with the new role.
        </p>
        {role && <p className="text-ink-soft">As {article(roleLabels[role])} {roleLabels[role].toLowerCase()} they can {roleReach[role]}.</p>}
      </ConfirmDialog>
    </li>
  );
}

const article = (word: string) => (/^[AEIOU]/i.test(word) ? "an" : "a");
