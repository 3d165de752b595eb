import { z } from "zod";
import { roles } from "@/lib/roles";
import { personName } from "./names";
import { emailField } from "./text";

/** One schema for the admin form (react-hook-form) and the server. */
export const newUserSchema = z.object({
  name: personName,
  email: emailField,
  role: z.enum(roles, { error: "Choose a role." }),
  password: z.string().min(10, "Use at least 10 characters.").max(200, "Keep the password under 200 characters."),
});
export type NewUserInput = z.infer<typeof newUserSchema>;

export const updateUserSchema = z
  .object({
    name: personName.optional(),
    role: z.enum(roles, { error: "Choose a role." }).optional(),
    disabled: z.boolean().optional(),
  })
  .refine((v) => v.name !== undefined || v.role !== undefined || v.disabled !== undefined, "Nothing to change.");
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

export const signInSchema = z.object({
  email: emailField,
  password: z.string().min(1, "Enter your password.").max(200, "Keep the password under 200 characters."),
});

/** Messages the sign-in form shows; next-auth passes a thrown error's message through as `error`. */
export const signInErrors = {
  credentials: "That e-mail and password do not match an account.",
  disabled: "This account has been disabled. Ask your administrator.",
} as const;
