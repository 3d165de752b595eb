"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { roleLabels, roles } from "@/lib/roles";
import { ApiError } from "@/components/spec/api";
import { useAddUser } from "./hooks";
import { newUserSchema, type NewUserInput } from "@/lib/validation/users";

export function AddUserForm() {
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, formState, setError, reset } = useForm<NewUserInput>({
    resolver: zodResolver(newUserSchema),
    defaultValues: { role: "designer" },
  });

  const add = useAddUser();
  const onSubmit = handleSubmit(async (values) => {
    setNotice(null);
    try {
      await add.mutateAsync(values);
      reset({ name: "", email: "", password: "", role: values.role });
      setNotice({ ok: true, text: `${values.name} can now sign in.` });
    } catch (err) {
      const e = err instanceof ApiError ? err : new ApiError(0, "network", "The user could not be added.");
      for (const [field, messages] of Object.entries(e.fields ?? {})) {
        if (field in values) setError(field as keyof NewUserInput, { type: "server", message: messages.join(" ") });
      }
      setNotice({ ok: false, text: e.message });
    }
  });

  const err = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Add a user">
      <div>
        <label className="label" htmlFor="new-name">Name</label>
        <input id="new-name" className="field" {...register("name")} />
        {err.name && <p className="field-error">{err.name.message}</p>}
      </div>
      <div>
        <label className="label" htmlFor="new-email">E-mail</label>
        <input id="new-email" type="email" className="field" {...register("email")} />
        {err.email && <p className="field-error">{err.email.message}</p>}
      </div>
      <div>
        <label className="label" htmlFor="new-role">Role</label>
        <select id="new-role" className="field" {...register("role")}>
          {roles.map((r) => <option key={r} value={r}>{roleLabels[r]}</option>)}
        </select>
        {err.role && <p className="field-error">{err.role.message}</p>}
      </div>
      <div>
        <label className="label" htmlFor="new-password">First password</label>
        <input id="new-password" type="password" autoComplete="new-password" className="field" {...register("password")} />
        {err.password && <p className="field-error">{err.password.message}</p>}
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
