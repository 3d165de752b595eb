"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { api, ApiError, errorText } from "@/components/spec/api";
import { applyServerErrors } from "@/components/ui/server-errors";
import { acceptInvitationSchema } from "@/lib/spec/committee";
import { FieldError } from "@/components/ui/field-error";

type Values = z.input<typeof acceptInvitationSchema>;

export function AcceptForm({ token, email, name }: { token: string; email: string; name: string }) {
  const router = useRouter();
  const form = useForm<Values, unknown, z.output<typeof acceptInvitationSchema>>({ resolver: zodResolver(acceptInvitationSchema), defaultValues: { token, name, password: "", confirm: "" } });
  const accept = useMutation({
    mutationFn: async (values: z.output<typeof acceptInvitationSchema>) => {
      const done = await api.acceptInvitation(values);
      // The account exists now: sign in with it as the sign-in page would.
      const res = await signIn("credentials", { email: done.email, password: values.password, redirect: false });
      if (!res || res.error) throw new ApiError(0, "unauthenticated", "Your account was made, but signing in failed: sign in with your e-mail and new password.");
      return done;
    },
    onSuccess: (done) => {
      router.replace(`/projects/${done.projectId}`);
      router.refresh();
    },
    onError: (err) => {
      if (err instanceof ApiError) applyServerErrors(form.setError, err.fields, ["name", "password", "confirm"]);
    },
  });
  const err = form.formState.errors;
  return (
    <form onSubmit={form.handleSubmit((v) => accept.mutate(v))} noValidate className="space-y-3" aria-label="Accept the invitation">
      <div>
        <label className="label" htmlFor="accept-email">E-mail</label>
        <input id="accept-email" className="field" value={email} readOnly autoComplete="username" />
      </div>
      <div>
        <label className="label" htmlFor="accept-name">Your name as others see it</label>
        <input id="accept-name" className="field" aria-invalid={!!err.name} {...form.register("name")} />
        <FieldError error={err.name} />
      </div>
      <div>
        <label className="label" htmlFor="accept-password">Password (at least 10 characters)</label>
        <input id="accept-password" type="password" className="field" autoComplete="new-password" aria-invalid={!!err.password} {...form.register("password")} />
        <FieldError error={err.password} />
      </div>
      <div>
        <label className="label" htmlFor="accept-confirm">The same password again</label>
        <input id="accept-confirm" type="password" className="field" autoComplete="new-password" aria-invalid={!!err.confirm} {...form.register("confirm")} />
        <FieldError error={err.confirm} />
      </div>
      {accept.error && !(accept.error instanceof ApiError && accept.error.fields) && <p role="alert" className="field-error">✕ {errorText(accept.error, "The invitation could not be accepted.")}</p>}
      <button type="submit" className="btn-primary w-full" disabled={accept.isPending}>{accept.isPending ? "Setting up…" : "Set my password and sign in"}</button>
    </form>
  );
}
