"use client";
import { useUsers } from "@/lib/query/hooks";
import { UserRow } from "./user-row";

export function UsersTable({ selfId }: { selfId: string }) {
  const users = useUsers().data ?? [];
  return (
    <table className="w-full text-sm" data-testid="users-table">
      <thead className="text-left text-xs uppercase tracking-wide text-tin">
        <tr>
          <th className="px-4 py-2">Name</th>
          <th className="px-4 py-2">E-mail</th>
          <th className="px-4 py-2">Role</th>
          <th className="px-4 py-2">Status</th>
          <th className="px-4 py-2"><span className="sr-only">Actions</span></th>
        </tr>
      </thead>
      <tbody>
        {users.map((u) => <UserRow key={u.id} user={u} isSelf={u.id === selfId} />)}
      </tbody>
    </table>
  );
}
