"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { roleLabels, roles } from "@/lib/roles";
import { ApiError } from "@/components/spec/api";
import { FieldError } from "@/components/ui/field-error";
import { useAddUser } from "./hooks";
import { newUserSchema, type NewUserInput } from "@/lib/validation/users";

export function AddUserForm() {
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, formState, setError, reset } = useForm<z.input<typeof newUserSchema>, unknown, NewUserInput>({
    resolver: zodResolver(newUserSchema),
    defaultValues: { role: "designer" },
  });
  // A message from the last try goes as soon as the form is changed: it may no longer be true.
  const clearNotice = () => setNotice(null);

  const add = useAddUser();
  const onSubmit = handleSubmit(async (values) => {
    setNotice(null);
    try {
      await add.mutateAsync(values);
      reset({ name: "", email: "", password: "", role: values.role });
      setNotice({ ok: true, text: `${values.name} can now sign in.` });
    } catch (err) {
      const e = err instanceof ApiError ? err : new ApiError(0, "network", "The user could not be added.");
      // A message shown beside its field is not repeated below the form.
      const placed = new Set<string>();
      for (const [field, messages] of Object.entries(e.fields ?? {})) {
        if (field in values) {
          setError(field as keyof NewUserInput, { type: "server", message: messages.join(" ") });
          messages.forEach((m) => placed.add(m));
        }
      }
      if (!placed.has(e.message)) setNotice({ ok: false, text: e.message });
    }
  });

  const err = formState.errors;
  return (
    <form onSubmit={onSubmit} onChange={clearNotice} noValidate className="space-y-3" aria-label="Add a user">
      <div>
        <label className="label" htmlFor="new-name">Name</label>
        <input id="new-name" aria-invalid={!!err.name} aria-describedby={err.name ? "new-name-error" : undefined} className="field" {...register("name")} />
        <FieldError id="new-name-error" error={err.name} />
      </div>
      <div>
        <label className="label" htmlFor="new-email">E-mail</label>
        <input id="new-email" aria-invalid={!!err.email} aria-describedby={err.email ? "new-email-error" : undefined} type="email" className="field" {...register("email")} />
        <FieldError id="new-email-error" error={err.email} />
      </div>
      <div>
        <label className="label" htmlFor="new-role">Role</label>
        <select id="new-role" aria-invalid={!!err.role} aria-describedby={err.role ? "new-role-error" : undefined} className="field" {...register("role")}>
          {roles.map((r) => <option key={r} value={r}>{roleLabels[r]}</option>)}
        </select>
        <FieldError id="new-role-error" error={err.role} />
      </div>
      <div>
        <label className="label" htmlFor="new-password">First password</label>
        <input id="new-password" aria-invalid={!!err.password} aria-describedby={err.password ? "new-password-error" : undefined} type="password" autoComplete="new-password" className="field" {...register("password")} />
        <FieldError id="new-password-error" error={err.password} />
      </div>
      {notice && (
        <p role="status" className={`text-sm ${notice.ok ? "text-fit" : "text-clash"}`}>
          <span aria-hidden="true">{notice.ok ? "✓ " : "✕ "}</span>{notice.text}
        </p>
      )}
      <button type="submit" className="btn-primary" disabled={formState.isSubmitting}>Add user</button>
    </form>
  );
}
