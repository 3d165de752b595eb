import type { Metadata } from "next";
import { listUsers } from "@/db/queries/users";
import { requirePageUser } from "@/lib/server/guard";
import { AddUserForm } from "./add-user-form";
import { UserRow } from "./user-row";

export const metadata: Metadata = { title: "Users" };

export default async function UsersPage() {
  const me = await requirePageUser("users:manage", "/admin/users");
  const users = await listUsers();
  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
      <section className="panel overflow-x-auto">
        <h1 className="border-b border-tin-rule px-4 py-3 text-2xl font-semibold">Users</h1>
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
            {users.map((u) => (
              <UserRow key={u.id} user={{ id: u.id, name: u.name, email: u.email, role: u.role, disabled: u.disabled }} isSelf={u.id === me.id} />
            ))}
          </tbody>
        </table>
      </section>
      <section className="panel p-4">
        <h2 className="mb-3 text-xl font-semibold">Add a user</h2>
        <AddUserForm />
      </section>
    </div>
  );
}
