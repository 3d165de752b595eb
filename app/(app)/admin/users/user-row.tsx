"use client";
import type { UserRow as Row } from "@/components/spec/api";
import { errorText } from "@/components/spec/api";
import { useChangeUser } from "./hooks";
import { roleLabels, roles, type Role } from "@/lib/roles";

export function UserRow({ user, isSelf }: { user: Row; isSelf: boolean }) {
  const mutation = useChangeUser();
  const pending = mutation.isPending;
  const error = mutation.error ? errorText(mutation.error) : null;
  const change = (change: { role?: Role; disabled?: boolean }) => mutation.mutate({ id: user.id, change });

  return (
    <tr className="border-t border-tin-rule align-top" data-testid={`user-${user.email}`}>
      <td className="px-4 py-2 font-medium">{user.name}{isSelf && <span className="ml-1 text-xs text-tin">(you)</span>}</td>
      <td className="px-4 py-2">{user.email}</td>
      <td className="px-4 py-2">
        <select
          aria-label={`Role of ${user.name}`}
          className="field py-1"
          value={user.role}
          disabled={pending || isSelf}
          onChange={(e) => change({ role: e.target.value as Role })}
        >
          {roles.map((r) => <option key={r} value={r}>{roleLabels[r]}</option>)}
        </select>
        {error && <p className="field-error" role="alert">{error}</p>}
      </td>
      <td className="px-4 py-2">
        {user.disabled ? <span className="text-clash">■ Disabled</span> : <span className="text-fit">● Active</span>}
      </td>
      <td className="px-4 py-2 text-right">
        {!isSelf && (
          <button type="button" className="btn" disabled={pending} onClick={() => change({ disabled: !user.disabled })}>
            {user.disabled ? "Enable" : "Disable"}
          </button>
        )}
      </td>
    </tr>
  );
}
