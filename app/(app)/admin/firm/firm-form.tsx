"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { ApiError } from "@/components/spec/api";
import { quoteApi } from "@/components/quote/api";
import { Field } from "@/components/quote/field";
import { StateMark } from "@/components/ui/state-mark";
import { applyServerErrors } from "@/components/ui/server-errors";
import type { FirmDetails } from "@/lib/quote/quotation";
import { firmDetailsSchema, LOGO_MAX_BYTES, type FirmDetailsInput } from "@/lib/validation/firm";

type Logo = { kind: "keep" } | { kind: "remove" } | { kind: "upload"; type: "image/png" | "image/svg+xml"; base64: string; preview: string };

function readFile(file: File): Promise<string> {
  return new Promise((resolve, reject) => {
    const r = new FileReader();
    r.onload = () => resolve(String(r.result).split(",")[1] ?? "");
    r.onerror = () => reject(new Error("The file could not be read."));
    r.readAsDataURL(file);
  });
}

export function FirmForm({ version: initialVersion, details }: { version: number; details: FirmDetails }) {
  const [version, setVersion] = useState(initialVersion);
  const [current, setCurrent] = useState(details);
  const [logo, setLogo] = useState<Logo>({ kind: "keep" });
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<FirmDetailsInput, unknown, z.output<typeof firmDetailsSchema>>({ resolver: zodResolver(firmDetailsSchema), defaultValues: details });
  const save = useMutation({
    mutationFn: (values: z.output<typeof firmDetailsSchema>) =>
      quoteApi.saveFirm({ version, details: values, logo: logo.kind === "upload" ? { kind: "upload", type: logo.type, base64: logo.base64 } : logo }),
    onSuccess: (saved) => {
      setVersion(saved.version);
      setCurrent(saved.details);
      setLogo({ kind: "keep" });
      form.reset(saved.details);
      setNotice({ ok: true, text: "Saved. New documents carry these details; issued tenders keep the ones they were issued with." });
    },
    onError: (err) => {
      if (err instanceof ApiError) {
        const rest = applyServerErrors(form.setError, err.fields, ["name", "address", "email", "phone", "website", "registration"], "details.");
        setNotice({ ok: false, text: [err.message, ...rest].join(" ") });
      } else setNotice({ ok: false, text: "The details could not be saved." });
    },
  });
  const err = form.formState.errors;
  const shown = logo.kind === "upload" ? logo.preview : logo.kind === "remove" ? null : current.logo ? `data:image/png;base64,${current.logo.png}` : null;
  return (
    <form noValidate aria-label="Firm details" className="grid gap-3 sm:grid-cols-2" onSubmit={form.handleSubmit((v) => { setNotice(null); save.mutate(v); })}>
      <Field id="firm-name" label="Name" error={err.name?.message} className="sm:col-span-2"><input id="firm-name" className="field" {...form.register("name")} /></Field>
      <Field id="firm-address" label="Address" error={err.address?.message} className="sm:col-span-2" hint="One line per line of the letterhead.">
        <textarea id="firm-address" rows={3} className="field" {...form.register("address")} />
      </Field>
      <Field id="firm-email" label="E-mail" error={err.email?.message}><input id="firm-email" type="email" className="field" {...form.register("email")} /></Field>
      <Field id="firm-phone" label="Telephone" error={err.phone?.message}><input id="firm-phone" className="field" {...form.register("phone")} /></Field>
      <Field id="firm-website" label="Website" error={err.website?.message}><input id="firm-website" className="field" {...form.register("website")} /></Field>
      <Field id="firm-registration" label="Registration line" error={err.registration?.message} hint="Company number, tax number…" className="sm:col-span-2"><input id="firm-registration" className="field" {...form.register("registration")} /></Field>
      <div className="sm:col-span-2">
        <span className="label">Logo</span>
        <div className="flex flex-wrap items-center gap-4">
          <div className="flex h-20 w-48 items-center justify-center rounded border border-dashed border-tin-rule bg-white p-2">
            {/* eslint-disable-next-line @next/next/no-img-element -- a data URL of the firm's own logo, not an optimisable asset */}
            {shown ? <img src={shown} alt="The firm's logo" className="max-h-full max-w-full" data-testid="firm-logo" /> : <span className="text-xs text-tin">No logo</span>}
          </div>
          <label className="btn cursor-pointer">
            Choose a PNG or SVG…
            <input
              type="file"
              accept="image/png,image/svg+xml"
              className="sr-only"
              aria-label="Logo file"
              onChange={async (e) => {
                const file = e.target.files?.[0];
                e.target.value = "";
                if (!file) return;
                if (file.size > LOGO_MAX_BYTES) return setNotice({ ok: false, text: "The logo file is larger than 512 KiB." });
                if (file.type !== "image/png" && file.type !== "image/svg+xml") return setNotice({ ok: false, text: "The logo must be a PNG or SVG file." });
                const base64 = await readFile(file);
                setLogo({ kind: "upload", type: file.type, base64, preview: `data:${file.type};base64,${base64}` });
                setNotice(null);
              }}
            />
          </label>
          {(current.logo || logo.kind === "upload") && logo.kind !== "remove" && (
            <button type="button" className="btn" onClick={() => setLogo({ kind: "remove" })}>Remove the logo</button>
          )}
          {logo.kind !== "keep" && <span className="inline-flex items-center gap-1 text-sm text-caution"><StateMark kind="unsaved" />Not saved yet</span>}
        </div>
        <p className="mt-1 text-xs text-tin">Shown at the top of the tender&rsquo;s cover. An SVG is drawn to an image when saved.</p>
      </div>
      <div className="flex items-center gap-3 sm:col-span-2">
        <button type="submit" className="btn-primary" disabled={save.isPending}>{save.isPending ? "Saving…" : "Save firm details"}</button>
        {notice && (
          <p role="status" className={`inline-flex items-center gap-1 text-sm ${notice.ok ? "text-fit" : "text-clash"}`}>
            <StateMark kind={notice.ok ? "saved" : "clash"} />{notice.text}
          </p>
        )}
      </div>
    </form>
  );
}
