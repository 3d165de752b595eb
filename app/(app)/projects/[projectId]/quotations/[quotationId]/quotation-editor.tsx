"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useMemo, useState } from "react";
import { useFieldArray, useForm, useWatch, type FieldErrors, type Resolver } from "react-hook-form";
import { ApiError } from "@/components/spec/api";
import { quoteApi, quoteKeys } from "@/components/quote/api";
import { Field } from "@/components/quote/field";
import { QuoteStatusBadge } from "@/components/quote/status";
import { formatDate, formatNumber } from "@/components/spec/format";
import { StateMark } from "@/components/ui/state-mark";
import { Caution } from "@/components/ui/caution";
import type { QuotationRead } from "@/db/queries/quotations";
import { documentKinds, documentLabels } from "@/lib/quote/access";
import {
  commercialSchema, lumpSumCategories, lumpSumCategoryLabels, taxTreatmentLabels, taxTreatments, type Commercial,
} from "@/lib/quote/commercial";
import { currencySymbol } from "@/lib/quote/currency";
import { programmeSvg, programmeWords } from "@/lib/quote/programme-chart";
import { diffMoney, formatAmount, priceQuotation, QuoteTotalsError, type QuoteTotals } from "@/lib/quote/totals";

/** The form holds exclusions as lines of text; everything else as the commercial terms themselves. */
type Form = Omit<Commercial, "exclusions" | "startDate"> & { exclusionsText: string; startDate: string };

function toForm(c: Commercial): Form {
  const { exclusions, startDate, ...rest } = c;
  return { ...rest, startDate: startDate ?? "", exclusionsText: exclusions.join("\n") };
}

function toCommercialInput(f: Form): unknown {
  const { exclusionsText, startDate, validityDays, ...rest } = f;
  return {
    ...rest,
    startDate: startDate || null,
    validityDays: typeof validityDays === "number" ? validityDays : Number(validityDays),
    exclusions: exclusionsText.split("\n").map((l) => l.trim()).filter(Boolean),
  };
}

function formPath(path: string): string {
  return path.startsWith("exclusions") ? "exclusionsText" : path;
}

function setNested(obj: Record<string, unknown>, path: string[], value: unknown) {
  let cur = obj;
  path.slice(0, -1).forEach((p, i) => {
    cur = (cur[p] ??= /^\d+$/.test(path[i + 1]!) ? [] : {}) as Record<string, unknown>;
  });
  cur[path[path.length - 1]!] = value;
}

let idCounter = 0;
const newId = (prefix: string) => `${prefix}-${Date.now().toString(36)}-${(idCounter++).toString(36)}`;

function Money({ amount, currency, testId }: { amount: string; currency: string; testId?: string }) {
  return <span className="num whitespace-nowrap" data-testid={testId}>{currencySymbol(currency)}{formatAmount(amount)}</span>;
}

function TotalsPanel({ totals, error }: { totals: QuoteTotals | null; error: string | null }) {
  if (!totals) return <section className="panel p-3 text-sm text-clash" data-testid="quote-totals"><StateMark kind="clash" /> {error}</section>;
  const t = totals;
  const row = (label: string, amount: string, strong = false, testId?: string) => (
    <div className={`flex justify-between gap-3 py-0.5 ${strong ? "border-t border-tin-rule pt-1 font-semibold" : ""}`}>
      <dt className="text-ink-soft">{label}</dt>
      <dd className="text-right"><Money amount={amount} currency={t.currency} testId={testId} /></dd>
    </div>
  );
  return (
    <section className="panel p-3 text-sm" aria-labelledby="totals-heading" data-testid="quote-totals">
      <h2 id="totals-heading" className="mb-1 text-lg font-semibold">Price</h2>
      <dl>
        {t.works.map((w) => <div key={w.id}>{row(w.label, w.amount)}</div>)}
        {row("Organ works", t.worksAmount, true)}
        {t.lumpSums.map((l) => <div key={l.id}>{row(l.description, l.amount)}</div>)}
        {t.provisionalSums.length > 0 && row("Provisional sums", t.provisionalAmount)}
        {row("Subtotal", t.subtotalAmount, true)}
        {t.discount.kind !== "none" && row(`Discount${t.discount.kind === "percent" ? ` ${t.discount.value} %` : ""}`, `-${t.discount.amount}`)}
        {row("Net", t.netAmount, true)}
        {row(t.tax.charged ? `Tax ${t.tax.percent} %` : `Tax (${taxTreatmentLabels[t.tax.treatment].toLowerCase()})`, t.tax.amount)}
        {row("Total", t.totalAmount, true, "quote-total")}
      </dl>
      {t.options.length > 0 && (
        <div className="mt-2">
          <h3 className="label">Options, apart from the total</h3>
          <dl>{t.options.map((o) => <div key={o.id}>{row(o.title, o.price)}</div>)}</dl>
        </div>
      )}
      <div className="mt-2">
        <h3 className="label">Payment stages</h3>
        <dl data-testid="quote-stages">{t.stages.map((s) => <div key={s.id}>{row(`${s.label} (${s.percent} %)`, s.amount)}</div>)}</dl>
      </div>
      <p className="mt-2 text-xs text-tin">Every total is the sum of the lines above it, to the cent.</p>
    </section>
  );
}

function ArrayHeader({ title, onAdd, addLabel, disabled }: { title: string; onAdd: () => void; addLabel: string; disabled: boolean }) {
  return (
    <div className="mb-2 flex items-center gap-2">
      <h3 className="flex-1 text-base font-semibold">{title}</h3>
      {!disabled && <button type="button" className="btn py-1 text-xs" onClick={onAdd}>{addLabel}</button>}
    </div>
  );
}

export function QuotationEditor({ initial, mayIssue, projectName }: { initial: QuotationRead; mayIssue: boolean; projectName: string }) {
  const qc = useQueryClient();
  const { data } = useQuery({ queryKey: quoteKeys.quotation(initial.id), queryFn: () => quoteApi.getQuotation(initial.id).then((r) => r.quotation), initialData: initial });
  const q = data.quotation;
  const draft = data.status === "draft";
  const editable = draft && mayIssue;
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);

  // One check for the browser and the server: the commercial schema, then the totals (a discount larger than the works).
  const resolver: Resolver<Form> = async (values) => {
    const parsed = commercialSchema.safeParse(toCommercialInput(values));
    const errors: Record<string, unknown> = {};
    if (!parsed.success) for (const i of parsed.error.issues) setNested(errors, formPath(i.path.join(".")).split("."), { type: "schema", message: i.message });
    else {
      try {
        priceQuotation(q.estimate, parsed.data);
      } catch (err) {
        if (err instanceof QuoteTotalsError) setNested(errors, err.field.split("."), { type: "totals", message: err.message });
      }
    }
    return Object.keys(errors).length ? { values: {}, errors: errors as FieldErrors<Form> } : { values, errors: {} };
  };
  const defaults = useMemo(() => toForm(q.commercial), [q.commercial]);
  const form = useForm<Form>({ resolver, defaultValues: defaults, mode: "onChange" });
  const { control, register } = form;
  const lumpSums = useFieldArray({ control, name: "lumpSums" });
  const provisional = useFieldArray({ control, name: "provisionalSums" });
  const options = useFieldArray({ control, name: "options" });
  const stages = useFieldArray({ control, name: "stages" });
  const watched = useWatch({ control }) as Form;

  // Live totals from the form as typed; the saved figures come from the server's own run of the same code.
  const live = useMemo((): { totals: QuoteTotals | null; error: string | null } => {
    if (!editable) return { totals: q.totals, error: null };
    const parsed = commercialSchema.safeParse(toCommercialInput(watched));
    if (!parsed.success) return { totals: null, error: "The figures wait for the terms to be complete: see the marked fields." };
    try {
      return { totals: priceQuotation(q.estimate, parsed.data), error: null };
    } catch (err) {
      return { totals: null, error: err instanceof Error ? err.message : "The terms do not add up." };
    }
  }, [watched, q, editable]);

  const onServerError = (err: unknown) => {
    if (err instanceof ApiError) {
      const rest: string[] = [];
      for (const [path, messages] of Object.entries(err.fields ?? {})) {
        if (path.startsWith("commercial.")) form.setError(formPath(path.slice("commercial.".length)) as "currency", { type: "server", message: messages.join(" ") });
        else rest.push(...messages);
      }
      setNotice({ ok: false, text: [err.message, ...rest].join(" ") });
    } else setNotice({ ok: false, text: "That did not work; nothing was changed." });
  };
  const accept = (r: { quotation: QuotationRead }) => {
    qc.setQueryData(quoteKeys.quotation(initial.id), r.quotation);
    void qc.invalidateQueries({ queryKey: quoteKeys.quotations(r.quotation.projectId) });
    form.reset(toForm(r.quotation.quotation.commercial));
  };
  const save = useMutation({
    mutationFn: (v: Form) => quoteApi.saveQuotation(data.id, { version: data.version, commercial: commercialSchema.parse(toCommercialInput(v)) }),
    onSuccess: (r) => { accept(r); setNotice({ ok: true, text: "Saved." }); },
    onError: onServerError,
  });
  const issue = useMutation({
    mutationFn: () => quoteApi.issueQuotation(data.id, data.version),
    onSuccess: (r) => { accept(r); setNotice({ ok: true, text: `Issued. Quotation ${r.quotation.number} is frozen: later changes to the scheme or the rates do not touch it.` }); },
    onError: onServerError,
  });
  const send = useMutation({
    mutationFn: () => quoteApi.sendTender(data.id),
    onSuccess: (r) => {
      accept(r);
      setNotice({ ok: true, text: `The tender went to ${r.sentTo} committee ${r.sentTo === 1 ? "member" : "members"} by e-mail, with the Word document attached. They find it and its price on the project page too.` });
    },
    onError: onServerError,
  });
  const decide = useMutation({
    mutationFn: (outcome: "accepted" | "declined") => quoteApi.decide(data.id, outcome),
    onSuccess: (r) => { accept(r); setNotice({ ok: true, text: `Recorded as ${r.quotation.status}.` }); },
    onError: onServerError,
  });

  const err = form.formState.errors;
  const dirty = form.formState.isDirty;
  const words = programmeWords(q.estimate.programme);
  const svg = useMemo(() => programmeSvg(q.estimate.programme, { width: 720 }), [q.estimate.programme]);
  const cur = q.commercial.currency;
  const disabled = !editable;

  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end gap-4">
        <div className="min-w-0 flex-1">
          <nav aria-label="Breadcrumb" className="text-xs text-tin">
            <Link href="/projects" className="hover:text-ink">Projects</Link> <span aria-hidden="true">/</span>{" "}
            <Link href={`/projects/${data.projectId}`} className="hover:text-ink">{projectName}</Link> <span aria-hidden="true">/</span>
          </nav>
          <h1 className="text-3xl font-semibold">Quotation <span className="num" data-testid="quote-number">{data.number}</span></h1>
          <p className="flex flex-wrap items-center gap-x-3 text-sm text-ink-soft">
            <QuoteStatusBadge status={data.status} />
            <span>Scheme {q.scheme.name}, version {q.scheme.version}</span>
            <span>Rates “{q.rateSet.name}” v{q.rateSet.version} (effective {formatDate(q.rateSet.effectiveDate)})</span>
            {q.issuedOn && <span>Issued {formatDate(q.issuedOn)}, valid until {formatDate(q.validUntil)}</span>}
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          {documentKinds.map((k) => (
            <a key={k} className="btn" href={`/api/quotations/${data.id}/documents/${k}`} data-testid={`download-${k}`}>{documentLabels[k]} (.docx)</a>
          ))}
        </div>
      </div>

      {draft && (
        <p className="rounded border border-tin-rule bg-paper-deep px-3 py-2 text-sm text-ink-soft">
          A draft is priced afresh from scheme version {q.scheme.version} and the rate set&rsquo;s version {q.rateSet.version} whenever it is opened. Issuing it freezes everything — the scheme, the rates, the estimate and these terms.
        </p>
      )}
      {notice && (
        <p role="status" className={`flex items-center gap-1.5 text-sm ${notice.ok ? "text-fit" : "text-clash"}`} data-testid="quote-notice">
          <StateMark kind={notice.ok ? "saved" : "clash"} />{notice.text}
        </p>
      )}

      <div className="grid gap-5 xl:grid-cols-[1fr_24rem]">
        <form
          noValidate
          aria-label="Commercial terms"
          className="min-w-0 space-y-4"
          onSubmit={form.handleSubmit((v) => { setNotice(null); save.mutate(v); }, () => setNotice({ ok: false, text: "Some terms are not valid; they are marked below. Nothing was saved." }))}
        >
          <fieldset disabled={disabled} className="panel grid gap-3 p-4 sm:grid-cols-3">
            <legend className="sr-only">Terms</legend>
            <Field id="q-validity" label="Valid for (days)" error={err.validityDays?.message}><input id="q-validity" type="number" className="field" {...register("validityDays", { valueAsNumber: true })} /></Field>
            <Field id="q-currency" label="Currency" error={err.currency?.message} hint="As the rate set prices."><input id="q-currency" className="field uppercase" maxLength={3} {...register("currency")} /></Field>
            <Field id="q-start" label="Work starts" error={err.startDate?.message} hint="Dates the programme."><input id="q-start" type="date" className="field" {...register("startDate")} /></Field>
            <Field id="q-tax-treatment" label="Tax" error={err.tax?.treatment?.message}>
              <select id="q-tax-treatment" className="field" {...register("tax.treatment")}>{taxTreatments.map((t) => <option key={t} value={t}>{taxTreatmentLabels[t]}</option>)}</select>
            </Field>
            <Field id="q-tax-percent" label="Tax rate (%)" error={err.tax?.percent?.message}><input id="q-tax-percent" className="field text-right" inputMode="decimal" {...register("tax.percent")} /></Field>
            <div className="grid grid-cols-2 gap-2">
              <Field id="q-discount-kind" label="Discount">
                <select id="q-discount-kind" className="field" {...register("discount.kind")}><option value="none">None</option><option value="amount">Amount</option><option value="percent">Percent</option></select>
              </Field>
              <Field id="q-discount-value" label="of" error={err.discount?.value?.message ?? err.discount?.message}>
                <input id="q-discount-value" className="field text-right" inputMode="decimal" disabled={watched.discount?.kind === "none"} {...register("discount.value")} />
              </Field>
            </div>
            <Field id="q-intro" label="Introduction (the tender's opening words; blank for the usual ones)" className="sm:col-span-3" error={err.introduction?.message}>
              <textarea id="q-intro" rows={3} className="field" {...register("introduction")} />
            </Field>
          </fieldset>

          <fieldset disabled={disabled} className="panel p-4">
            <legend className="sr-only">Lump sums</legend>
            <ArrayHeader title="Lump sums — work the model does not compute" addLabel="Add a lump sum" disabled={disabled} onAdd={() => lumpSums.append({ id: newId("lump"), category: "other", description: "", quantity: "1", unit: "item", unitPrice: "" })} />
            {lumpSums.fields.length === 0 && <p className="text-sm text-tin">None.</p>}
            {lumpSums.fields.map((f, i) => {
              const e = err.lumpSums?.[i];
              return (
                <div key={f.id} className="mb-2 grid gap-2 border-t border-tin-rule pt-2 sm:grid-cols-[10rem_1fr_5rem_5rem_8rem_auto]" data-testid={`lump-${i}`}>
                  <Field id={`lump-${i}-category`} label="Category"><select id={`lump-${i}-category`} className="field" {...register(`lumpSums.${i}.category`)}>{lumpSumCategories.map((c) => <option key={c} value={c}>{lumpSumCategoryLabels[c]}</option>)}</select></Field>
                  <Field id={`lump-${i}-description`} label="Description" error={e?.description?.message}><input id={`lump-${i}-description`} className="field" {...register(`lumpSums.${i}.description`)} /></Field>
                  <Field id={`lump-${i}-quantity`} label="Quantity" error={e?.quantity?.message}><input id={`lump-${i}-quantity`} className="field text-right" inputMode="decimal" {...register(`lumpSums.${i}.quantity`)} /></Field>
                  <Field id={`lump-${i}-unit`} label="Unit" error={e?.unit?.message}><input id={`lump-${i}-unit`} className="field" {...register(`lumpSums.${i}.unit`)} /></Field>
                  <Field id={`lump-${i}-price`} label={`Unit price (${cur})`} error={e?.unitPrice?.message}><input id={`lump-${i}-price`} className="field text-right" inputMode="decimal" {...register(`lumpSums.${i}.unitPrice`)} /></Field>
                  {!disabled && <button type="button" className="btn self-end py-1.5 text-xs" aria-label={`Remove lump sum ${i + 1}`} onClick={() => lumpSums.remove(i)}>Remove</button>}
                </div>
              );
            })}
          </fieldset>

          <fieldset disabled={disabled} className="panel p-4">
            <legend className="sr-only">Provisional sums</legend>
            <ArrayHeader title="Provisional sums" addLabel="Add a provisional sum" disabled={disabled} onAdd={() => provisional.append({ id: newId("prov"), description: "", amount: "" })} />
            {provisional.fields.length === 0 && <p className="text-sm text-tin">None.</p>}
            {provisional.fields.map((f, i) => (
              <div key={f.id} className="mb-2 grid gap-2 border-t border-tin-rule pt-2 sm:grid-cols-[1fr_10rem_auto]">
                <Field id={`prov-${i}-description`} label="Allowance for" error={err.provisionalSums?.[i]?.description?.message}><input id={`prov-${i}-description`} className="field" {...register(`provisionalSums.${i}.description`)} /></Field>
                <Field id={`prov-${i}-amount`} label={`Amount (${cur})`} error={err.provisionalSums?.[i]?.amount?.message}><input id={`prov-${i}-amount`} className="field text-right" inputMode="decimal" {...register(`provisionalSums.${i}.amount`)} /></Field>
                {!disabled && <button type="button" className="btn self-end py-1.5 text-xs" aria-label={`Remove provisional sum ${i + 1}`} onClick={() => provisional.remove(i)}>Remove</button>}
              </div>
            ))}
          </fieldset>

          <fieldset disabled={disabled} className="panel p-4">
            <legend className="sr-only">Options</legend>
            <ArrayHeader title="Priced options (shown apart from the total)" addLabel="Add an option" disabled={disabled} onAdd={() => options.append({ id: newId("opt"), title: "", description: "", price: "" })} />
            {options.fields.length === 0 && <p className="text-sm text-tin">None.</p>}
            {options.fields.map((f, i) => (
              <div key={f.id} className="mb-2 grid gap-2 border-t border-tin-rule pt-2 sm:grid-cols-[1fr_1fr_9rem_auto]" data-testid={`option-${i}`}>
                <Field id={`opt-${i}-title`} label="Option" error={err.options?.[i]?.title?.message}><input id={`opt-${i}-title`} className="field" {...register(`options.${i}.title`)} /></Field>
                <Field id={`opt-${i}-description`} label="Description" error={err.options?.[i]?.description?.message}><input id={`opt-${i}-description`} className="field" {...register(`options.${i}.description`)} /></Field>
                <Field id={`opt-${i}-price`} label={`Price (${cur})`} error={err.options?.[i]?.price?.message}><input id={`opt-${i}-price`} className="field text-right" inputMode="decimal" {...register(`options.${i}.price`)} /></Field>
                {!disabled && <button type="button" className="btn self-end py-1.5 text-xs" aria-label={`Remove option ${i + 1}`} onClick={() => options.remove(i)}>Remove</button>}
              </div>
            ))}
          </fieldset>

          <fieldset disabled={disabled} className="panel p-4">
            <legend className="sr-only">Payment stages</legend>
            <ArrayHeader title="Payment stages (must add up to 100 %)" addLabel="Add a stage" disabled={disabled} onAdd={() => stages.append({ id: newId("stage"), label: "", percent: "" })} />
            {err.stages?.message && <p className="field-error mb-2" role="alert">{err.stages.message}</p>}
            {err.stages?.root?.message && <p className="field-error mb-2" role="alert">{err.stages.root.message}</p>}
            {stages.fields.map((f, i) => (
              <div key={f.id} className="mb-2 grid gap-2 sm:grid-cols-[1fr_7rem_auto]">
                <Field id={`stage-${i}-label`} label={`Stage ${i + 1}`} error={err.stages?.[i]?.label?.message}><input id={`stage-${i}-label`} className="field" {...register(`stages.${i}.label`)} /></Field>
                <Field id={`stage-${i}-percent`} label="Share (%)" error={err.stages?.[i]?.percent?.message}><input id={`stage-${i}-percent`} className="field text-right" inputMode="decimal" {...register(`stages.${i}.percent`)} /></Field>
                {!disabled && stages.fields.length > 1 && <button type="button" className="btn self-end py-1.5 text-xs" aria-label={`Remove stage ${i + 1}`} onClick={() => stages.remove(i)}>Remove</button>}
              </div>
            ))}
          </fieldset>

          <fieldset disabled={disabled} className="panel p-4">
            <legend className="sr-only">Exclusions</legend>
            <Field id="q-exclusions" label="Exclusions — one per line" error={err.exclusionsText?.message}><textarea id="q-exclusions" rows={4} className="field" {...register("exclusionsText")} /></Field>
          </fieldset>

          {editable && (
            <div className="flex flex-wrap items-center gap-3">
              <button type="submit" className="btn-primary" disabled={save.isPending || !dirty}>{save.isPending ? "Saving…" : "Save the terms"}</button>
              {dirty && <span className="inline-flex items-center gap-1 text-sm text-caution"><StateMark kind="unsaved" />Unsaved changes</span>}
              <button
                type="button"
                className="btn ml-auto"
                disabled={dirty || issue.isPending}
                title={dirty ? "Save the terms first" : undefined}
                onClick={() => { if (window.confirm(`Issue quotation ${data.number}? It is then frozen: it keeps its own copy of the scheme, rates, figures and terms.`)) issue.mutate(); }}
              >
                {issue.isPending ? "Issuing…" : "Issue the quotation"}
              </button>
            </div>
          )}
          {data.status === "issued" && mayIssue && (
            <div className="flex flex-wrap items-center gap-3">
              <button
                type="button"
                className={data.sentAt ? "btn" : "btn-primary"}
                disabled={send.isPending}
                onClick={() => {
                  const again = data.sentAt ? ` It was sent on ${formatDate(data.sentAt)}; each member gets it again.` : "";
                  if (window.confirm(`Send tender ${data.number} to the project's committee by e-mail?${again} From then on they see it and its price.`)) send.mutate();
                }}
              >
                {send.isPending ? "Sending…" : data.sentAt ? "Send the tender again" : "Send the tender to the committee"}
              </button>
              {data.sentAt && <span className="text-sm text-ink-soft" data-testid="tender-sent">Sent to the committee on {formatDate(data.sentAt)}.</span>}
            </div>
          )}
          {data.status === "issued" && mayIssue && (
            <div className="flex flex-wrap items-center gap-3">
              <span className="text-sm text-ink-soft">The committee&rsquo;s answer:</span>
              <button type="button" className="btn" onClick={() => decide.mutate("accepted")} disabled={decide.isPending}>Record acceptance</button>
              <button type="button" className="btn" onClick={() => decide.mutate("declined")} disabled={decide.isPending}>Record decline</button>
            </div>
          )}
          {data.status === "lapsed" && <p className="text-sm text-caution"><StateMark kind="caution" /> This quotation lapsed on {formatDate(data.validUntil)}. Make a new one from the project page to price the current scheme and rates.</p>}
        </form>

        <aside className="space-y-4">
          <TotalsPanel totals={live.totals} error={live.error} />
          <section className="panel p-3 text-sm" aria-labelledby="estimate-heading">
            <h2 id="estimate-heading" className="mb-1 text-lg font-semibold">From the estimate</h2>
            <dl className="space-y-0.5">
              <div className="flex justify-between"><dt className="text-ink-soft">Pipes in the organ</dt><dd className="num">{formatNumber(q.estimate.totals.pipes.total)}</dd></div>
              <div className="flex justify-between"><dt className="text-ink-soft">Hours</dt><dd className="num">{formatNumber(q.estimate.totals.hoursTotal, 1)}</dd></div>
              <div className="flex justify-between"><dt className="text-ink-soft">Direct cost</dt><dd><Money amount={q.estimate.money.subtotalAmount} currency={cur} /></dd></div>
              <div className="flex justify-between"><dt className="text-ink-soft">Overheads, contingency, margin</dt><dd><Money amount={diffMoney(q.estimate.money.subtotalAmount, q.estimate.money.netAmount)} currency={cur} /></dd></div>
            </dl>
          </section>
        </aside>
      </div>

      <section className="panel p-4" aria-labelledby="programme-heading">
        <h2 id="programme-heading" className="mb-2 text-xl font-semibold">Programme</h2>
        <div className="overflow-x-auto" dangerouslySetInnerHTML={{ __html: svg }} />
        <p className="mt-2 text-sm">{words.headline}</p>
        <p className={`mt-1 flex items-center gap-1.5 text-sm font-semibold ${words.late ? "text-clash" : "text-ink"}`} data-testid="programme-words" data-late={words.late}>
          {words.late && <StateMark kind="clash" />}{words.detail}
        </p>
      </section>
      {q.estimate.cautions.map((c) => <Caution key={c.code}>{c.text}</Caution>)}
    </div>
  );
}
