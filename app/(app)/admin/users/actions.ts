"use server";
import { z } from "zod";
import { createUser, updateUser } from "@/db/queries/users";
import { action } from "@/lib/server/guard";
import { newUserSchema, updateUserSchema } from "@/lib/validation/users";

export const addUserAction = action({ permission: "users:manage", input: newUserSchema }, async ({ input }) => {
  const user = await createUser({ input });
  return { id: user.id };
});

const changeSchema = z.object({ id: z.uuid(), change: updateUserSchema });

export const changeUserAction = action({ permission: "users:manage", input: changeSchema }, async ({ input, user }) => {
  const updated = await updateUser({ id: input.id, input: input.change, actingUserId: user.id });
  return { id: updated.id, role: updated.role, disabled: updated.disabled };
});
