"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError } from "@/components/spec/api";
import { quoteApi } from "@/components/quote/api";
import { Field } from "@/components/quote/field";

export function NewRateSetForm({ sets }: { sets: { id: string; name: string; isCurrent: boolean }[] }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [copyFrom, setCopyFrom] = useState(sets.find((s) => s.isCurrent)?.id ?? sets[0]?.id ?? "");
  const [error, setError] = useState<string | null>(null);
  const create = useMutation({
    mutationFn: () => quoteApi.createRateSet({ name: name.trim(), copyFrom: copyFrom || null }),
    onSuccess: ({ rateSet }) => router.push(`/rates/${rateSet.id}`),
    onError: (err) => setError(err instanceof ApiError ? (err.fields?.name?.join(" ") ?? err.message) : "The rate set could not be made."),
  });
  return (
    <form noValidate aria-label="New rate set" className="grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end" onSubmit={(e) => { e.preventDefault(); if (!name.trim()) return setError("Give the rate set a name."); setError(null); create.mutate(); }}>
      <Field id="set-name" label="Name" error={error ?? undefined}><input id="set-name" className="field" placeholder="e.g. Export work 2028" value={name} onChange={(e) => setName(e.target.value)} /></Field>
      <Field id="set-copy" label="Start from a copy of">
        <select id="set-copy" className="field" value={copyFrom} onChange={(e) => setCopyFrom(e.target.value)}>
          {sets.map((s) => <option key={s.id} value={s.id}>{s.name}{s.isCurrent ? " (current)" : ""}</option>)}
        </select>
      </Field>
      <button type="submit" className="btn-primary" disabled={create.isPending}>{create.isPending ? "Making…" : "Make the set"}</button>
    </form>
  );
}
