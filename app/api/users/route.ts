import { createUser, listUsers } from "@/db/queries/users";
import { route } from "@/lib/server/guard";
import { newUserSchema } from "@/lib/validation/users";

export const GET = route({ permission: "users:manage" }, async () => ({ users: await listUsers() }));

export const POST = route({ permission: "users:manage", body: newUserSchema }, async ({ body }) => {
  const user = await createUser({ input: body });
  return Response.json({ user }, { status: 201 });
});
