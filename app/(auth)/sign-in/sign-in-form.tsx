"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { signInErrors, signInSchema } from "@/lib/validation/users";
import { FieldError } from "@/components/ui/field-error";

type Values = z.input<typeof signInSchema>;

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Values>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setError(null);
    const res = await signIn("credentials", { ...values, redirect: false });
    if (!res || res.error) {
      // next-auth reports a failed password check as "CredentialsSignin"; other errors carry our message.
      setError(!res || res.error === "CredentialsSignin" ? signInErrors.credentials : res.error);
      return;
    }
    router.replace(callbackUrl);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <div>
        <label className="label" htmlFor="email">E-mail</label>
        <input id="email" type="email" autoComplete="username" className="field" {...register("email")} />
        <FieldError error={formState.errors.email} />
      </div>
      <div>
        <label className="label" htmlFor="password">Password</label>
        <input id="password" type="password" autoComplete="current-password" className="field" {...register("password")} />
        <FieldError error={formState.errors.password} />
      </div>
      {error && (
        <p role="alert" data-testid="sign-in-error" className="rounded border border-clash/40 bg-clash-light px-3 py-2 text-sm text-clash">
          <span aria-hidden="true">✕ </span>{error}
        </p>
      )}
      <button type="submit" className="btn-primary w-full justify-center" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}
