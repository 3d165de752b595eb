import type { Metadata } from "next";
import { listUsers } from "@/db/queries/users";
import { keys } from "@/lib/query/keys";
import { Hydrate, prefetch } from "@/lib/query/server";
import { requirePageUser } from "@/lib/server/guard";
import { AddUserForm } from "./add-user-form";
import { UsersTable } from "./users-table";

export const metadata: Metadata = { title: "Users" };

export default async function UsersPage() {
  const me = await requirePageUser("users:manage", "/admin/users");
  // The same fields the browser's own read (GET /api/users) keeps.
  await prefetch(keys.users.list, async () => (await listUsers()).map((u) => ({ id: u.id, name: u.name, email: u.email, role: u.role, disabled: u.disabled })));
  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
      <section className="panel overflow-x-auto">
        <h1 className="border-b border-tin-rule px-4 py-3 text-2xl font-semibold">Users</h1>
        <Hydrate>
          <UsersTable selfId={me.id} />
        </Hydrate>
      </section>
      <section className="panel p-4">
        <h2 className="mb-3 text-xl font-semibold">Add a user</h2>
        <Hydrate>
          <AddUserForm />
        </Hydrate>
      </section>
    </div>
  );
}
