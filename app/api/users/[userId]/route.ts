import { updateUser } from "@/db/queries/users";
import { route } from "@/lib/server/guard";
import { userParams } from "@/lib/server/params";
import { updateUserSchema } from "@/lib/validation/users";

export const PATCH = route({ permission: "users:manage", params: userParams, body: updateUserSchema }, async ({ body, params, user }) => ({
  user: await updateUser({ id: params.userId, input: body, actingUserId: user.id }),
}));
