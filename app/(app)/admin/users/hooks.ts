"use client";
// The users page's writes: its server actions (guarded like every route) as mutations that refresh the list.
import { unwrapAction } from "@/components/spec/api";
import { useWrite } from "@/lib/query/hooks";
import { keys } from "@/lib/query/keys";
import type { Role } from "@/lib/roles";
import type { NewUserInput } from "@/lib/validation/users";
import { addUserAction, changeUserAction } from "./actions";

export const useAddUser = () => useWrite(async (input: NewUserInput) => unwrapAction(await addUserAction(input)), () => [keys.users.list]);
export const useChangeUser = () =>
  useWrite(async (args: { id: string; change: { role?: Role; disabled?: boolean } }) => unwrapAction(await changeUserAction(args)), () => [keys.users.list]);
