import { z } from "zod";
import { updateUser } from "@/db/queries/users";
import { AppError } from "@/lib/server/errors";
import { route } from "@/lib/server/guard";
import { updateUserSchema } from "@/lib/validation/users";

export const PATCH = route<typeof updateUserSchema, { userId: string }>(
  { permission: "users:manage", body: updateUserSchema },
  async ({ body, params, user }) => {
    if (!z.uuid().safeParse(params.userId).success) throw new AppError("not_found", "No such user.");
    return { user: await updateUser({ id: params.userId, input: body, actingUserId: user.id }) };
  },
);
