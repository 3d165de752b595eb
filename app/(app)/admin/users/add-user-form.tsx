"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { roleLabels, roles } from "@/lib/roles";
import { newUserSchema, type NewUserInput } from "@/lib/validation/users";
import { addUserAction } from "./actions";

export function AddUserForm() {
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, formState, setError, reset } = useForm<NewUserInput>({
    resolver: zodResolver(newUserSchema),
    defaultValues: { role: "designer" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setNotice(null);
    const res = await addUserAction(values);
    if (res.ok) {
      reset({ name: "", email: "", password: "", role: values.role });
      setNotice({ ok: true, text: `${values.name} can now sign in.` });
      return;
    }
    for (const [field, messages] of Object.entries(res.fields ?? {})) {
      if (field in values) setError(field as keyof NewUserInput, { type: "server", message: messages.join(" ") });
    }
    setNotice({ ok: false, text: res.message });
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
