"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useMemo, useState } from "react";
import { useForm, useWatch, type FieldErrors, type Resolver, type UseFormRegister } from "react-hook-form";
import { ApiError } from "@/components/spec/api";
import { quoteApi, quoteKeys, type ImportPreview, type RateSetRead } from "@/components/quote/api";
import { Field } from "@/components/quote/field";
import { formatDate, formatDateTime } from "@/components/spec/format";
import { StateMark } from "@/components/ui/state-mark";
import {
  checkRates, flattenForm, flattenRates, nestValues, rateBookFields, rateBookTree, unitText, type RateField, type RateNode,
} from "@/lib/rates-book";

type Form = { effectiveDate: string; note: string; rates: Record<string, unknown> };
type Group = Extract<RateNode, { type: "group" }>;

function errorAt(errors: FieldErrors<Form>, key: string): string | undefined {
  let cur: unknown = errors.rates;
  for (const p of key.split(".")) cur = (cur as Record<string, unknown> | undefined)?.[p];
  return (cur as { message?: string } | undefined)?.message;
}

function setNested(obj: Record<string, unknown>, path: string[], value: unknown) {
  let cur = obj;
  for (const p of path.slice(0, -1)) cur = (cur[p] ??= {}) as Record<string, unknown>;
  cur[path[path.length - 1]!] = value;
}

/** The estimator's own check, run in the browser before anything is sent; the server runs it again. */
const resolver: Resolver<Form> = async (values) => {
  const checked = checkRates(flattenForm(rateBookFields, values.rates));
  const errors: Record<string, unknown> = {};
  if (!/^\d{4}-\d{2}-\d{2}$/.test(values.effectiveDate)) errors.effectiveDate = { type: "format", message: "Give the effective date as a date like 2027-01-31." };
  if (!checked.ok) for (const [key, messages] of Object.entries(checked.problems)) setNested(errors, ["rates", ...key.split(".")], { type: "rates", message: messages.join(" ") });
  return Object.keys(errors).length ? { values: {}, errors: errors as FieldErrors<Form> } : { values, errors: {} };
};

function Input({ f, register, errors, currency, label, showUnit = true }: { f: RateField; register: UseFormRegister<Form>; errors: FieldErrors<Form>; currency: string; label: string; showUnit?: boolean }) {
  const id = `rate-${f.key.replace(/[^A-Za-z0-9]/g, "-")}`;
  const error = errorAt(errors, f.key);
  const unit = unitText(f, currency);
  return (
    <span className="block">
      <span className="flex items-center gap-1.5">
        <input
          id={id}
          aria-label={label}
          aria-invalid={!!error}
          aria-describedby={error ? `${id}-error` : undefined}
          inputMode={f.kind === "text" ? "text" : "decimal"}
          className={`field py-1 ${f.kind === "text" ? "" : "text-right num"} ${error ? "border-clash" : ""}`}
          data-key={f.key}
          {...register(`rates.${f.key}` as `rates.${string}`)}
        />
        {unit && showUnit && <span className="w-16 shrink-0 text-xs text-tin">{unit}</span>}
      </span>
      {error && <span className="field-error block" id={`${id}-error`} role="alert">{error}</span>}
    </span>
  );
}

/** Children that are groups of plain fields with the same keys (hours per size class, crew per department…) become one matrix. */
function matrixOf(children: readonly RateNode[]): { groups: Group[]; columns: RateField[] } | null {
  const groups = children.filter((c): c is Group => c.type === "group" && c.children.every((x) => x.type === "field"));
  if (groups.length < 2) return null;
  const sig = (g: Group) => g.children.map((c) => (c.type === "field" ? c.field.path.at(-1) : "")).join("|");
  const first = sig(groups[0]!);
  const same = groups.filter((g) => sig(g) === first);
  if (same.length < 2) return null;
  return { groups: same, columns: same[0]!.children.map((c) => (c as { field: RateField }).field) };
}

function Section({ node, depth, register, errors, currency }: { node: Group; depth: number; register: UseFormRegister<Form>; errors: FieldErrors<Form>; currency: string }) {
  const leaves = node.children.filter((c): c is Extract<RateNode, { type: "field" }> => c.type === "field").map((c) => c.field);
  const matrix = matrixOf(node.children);
  const inMatrix = new Set(matrix?.groups.map((g) => g.key));
  const others = node.children.filter((c): c is Group => c.type === "group" && !inMatrix.has(c.key));
  const Heading = depth === 0 ? "h2" : "h3";
  return (
    <section className={depth === 0 ? "panel p-4" : "mt-4"} aria-label={node.label} data-testid={`rates-section-${node.key}`}>
      <Heading className={depth === 0 ? "mb-2 text-xl font-semibold" : "label mb-1"}>{node.label}</Heading>
      {node.description && <p className="mb-2 text-xs text-tin">{node.description}</p>}
      {leaves.length > 0 && (
        <div className="grid gap-x-6 gap-y-2 sm:grid-cols-2">
          {leaves.map((f) => (
            <label key={f.key} className={`grid items-start gap-2 text-sm ${f.kind === "text" && f.key !== "currency" ? "grid-cols-1 sm:col-span-2 sm:grid-cols-[1fr_22rem]" : "grid-cols-[1fr_minmax(0,12rem)]"}`} htmlFor={`rate-${f.key.replace(/[^A-Za-z0-9]/g, "-")}`}>
              <span className="pt-1.5" title={f.description}>{f.label}</span>
              <Input f={f} register={register} errors={errors} currency={currency} label={[...f.groupLabels, f.label].join(" — ")} />
            </label>
          ))}
        </div>
      )}
      {matrix && (
        <div className="mt-2 overflow-x-auto">
          <table className="w-full text-sm">
            <thead className="text-left text-xs text-tin">
              <tr>
                <th className="py-1 pr-2 font-semibold"><span className="sr-only">Item</span></th>
                {matrix.columns.map((c) => <th key={c.key} className="px-1 py-1 text-right font-semibold">{c.label}</th>)}
              </tr>
            </thead>
            <tbody>
              {matrix.groups.map((g) => (
                <tr key={g.key} className="border-t border-tin-rule align-top">
                  <th scope="row" className="py-1.5 pr-2 text-left font-normal">
                    {g.label}
                    {unitText(matrix.columns[0]!, currency) && <span className="block text-xs text-tin">{unitText((g.children[0] as { field: RateField }).field, currency)}</span>}
                  </th>
                  {g.children.map((c) => {
                    const f = (c as { field: RateField }).field;
                    return <td key={f.key} className="min-w-[6.5rem] px-1 py-1"><Input f={f} register={register} errors={errors} currency={currency} label={[...f.groupLabels, f.label].join(" — ")} showUnit={false} /></td>;
                  })}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {others.map((g) => <Section key={g.key} node={g} depth={depth + 1} register={register} errors={errors} currency={currency} />)}
    </section>
  );
}

function formValues(data: RateSetRead): Form {
  return { effectiveDate: new Date().toISOString().slice(0, 10), note: "", rates: nestValues(rateBookFields, flattenRates(rateBookFields, data.current.rates)) };
}

function ImportPanel({ setId, version, onSaved }: { setId: string; version: number; onSaved: () => void }) {
  const [csv, setCsv] = useState<string | null>(null);
  const [fileName, setFileName] = useState("");
  const [preview, setPreview] = useState<ImportPreview | null>(null);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const check = useMutation({
    mutationFn: (text: string) => quoteApi.importCsv(setId, { version, csv: text, commit: false }),
    onSuccess: (r) => setPreview(r.preview),
    onError: (err) => setMessage({ ok: false, text: err instanceof ApiError ? err.message : "The file could not be checked." }),
  });
  const commit = useMutation({
    mutationFn: () => quoteApi.importCsv(setId, { version, csv: csv!, commit: true }),
    onSuccess: (r) => { setMessage({ ok: true, text: `Saved as version ${r.savedVersion}.` }); setPreview(null); setCsv(null); onSaved(); },
    onError: (err) => setMessage({ ok: false, text: err instanceof ApiError ? err.message : "The file could not be saved." }),
  });
  const shown = preview ? preview.rows.filter((r) => r.changed || r.problems.length) : [];
  return (
    <section className="panel p-4" aria-labelledby="import-heading">
      <h2 id="import-heading" className="text-lg font-semibold">Import from a spreadsheet</h2>
      <p className="mb-2 text-xs text-ink-soft">Export the set, change the values in a spreadsheet, save as CSV and choose the file here. You see every change and every bad row before anything is saved; a file with any bad row saves nothing.</p>
      <label className="btn cursor-pointer">
        Choose a CSV file…
        <input type="file" accept=".csv,text/csv" className="sr-only" aria-label="CSV file" onChange={async (e) => {
          const file = e.target.files?.[0];
          e.target.value = "";
          if (!file) return;
          setMessage(null);
          const text = await file.text();
          setCsv(text);
          setFileName(file.name);
          check.mutate(text);
        }} />
      </label>
      {fileName && <span className="ml-2 text-xs text-tin">{fileName}</span>}
      {preview && (
        <div className="mt-3 space-y-2" data-testid="import-preview" data-ok={preview.ok}>
          <p className={`flex items-center gap-1.5 text-sm font-semibold ${preview.ok ? "text-fit" : "text-clash"}`}>
            <StateMark kind={preview.ok ? "fit" : "clash"} />
            {preview.ok
              ? `The file is good: ${preview.changedCount} ${preview.changedCount === 1 ? "value changes" : "values change"}${preview.effectiveDate ? `, effective ${formatDate(preview.effectiveDate)}` : ""}.`
              : `The file has problems (${preview.rows.filter((r) => r.problems.length).length} bad ${preview.rows.filter((r) => r.problems.length).length === 1 ? "row" : "rows"}${preview.fileProblems.length ? `, ${preview.fileProblems.length} in the file as a whole` : ""}); nothing will be saved.`}
          </p>
          {preview.fileProblems.length > 0 && <ul className="list-disc pl-5 text-sm text-clash">{preview.fileProblems.map((p, i) => <li key={i}>{p}</li>)}</ul>}
          {shown.length > 0 && (
            <div className="max-h-96 overflow-auto rounded border border-tin-rule">
              <table className="w-full text-xs">
                <thead className="sticky top-0 bg-paper-deep text-left text-tin"><tr><th className="px-2 py-1">Row</th><th className="px-2 py-1">Rate</th><th className="px-2 py-1 text-right">Was</th><th className="px-2 py-1 text-right">Becomes</th><th className="px-2 py-1">Problem</th></tr></thead>
                <tbody>
                  {shown.map((r) => (
                    <tr key={r.row} className={`border-t border-tin-rule align-top ${r.problems.length ? "bg-clash-light" : ""}`} data-testid={`import-row-${r.row}`}>
                      <td className="px-2 py-1 num">{r.row}</td>
                      <td className="px-2 py-1">{r.label || r.key}</td>
                      <td className="px-2 py-1 text-right num">{r.previous ?? ""}</td>
                      <td className="px-2 py-1 text-right num font-semibold">{r.value} {r.unit && <span className="font-normal text-tin">{r.unit}</span>}</td>
                      <td className="px-2 py-1 text-clash">{r.problems.join(" ")}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
          <button type="button" className="btn-primary" disabled={!preview.ok || commit.isPending || preview.changedCount === 0} onClick={() => commit.mutate()}>
            {commit.isPending ? "Saving…" : `Save as version ${version + 1}`}
          </button>
        </div>
      )}
      {message && <p role="status" className={`mt-2 text-sm ${message.ok ? "text-fit" : "text-clash"}`}>{message.text}</p>}
    </section>
  );
}

function ComparePanel({ data }: { data: RateSetRead }) {
  const [from, setFrom] = useState(Math.max(1, data.set.version - 1));
  const to = data.set.version;
  const compare = useQuery({ queryKey: [...quoteKeys.rateSet(data.set.id), "compare", from, to], queryFn: () => quoteApi.compare(data.set.id, from, to), enabled: from !== to });
  return (
    <section className="panel p-4" aria-labelledby="versions-heading">
      <h2 id="versions-heading" className="text-lg font-semibold">Versions</h2>
      <ol className="mt-2 max-h-56 space-y-1 overflow-auto text-xs">
        {data.versions.map((v) => (
          <li key={v.version} className="flex flex-wrap items-baseline gap-x-2">
            <span className="num font-semibold">v{v.version}</span>
            <span className="text-ink-soft">effective {formatDate(v.effectiveDate)}</span>
            <span className="text-tin">{formatDateTime(v.createdAt)}{v.authorName ? ` · ${v.authorName}` : ""}</span>
            {v.note && <span className="italic text-ink-soft">“{v.note}”</span>}
            <a className="underline decoration-tin-rule hover:decoration-brass" href={`/api/rate-sets/${data.set.id}/csv?version=${v.version}`}>CSV</a>
          </li>
        ))}
      </ol>
      {data.set.version > 1 && (
        <div className="mt-3">
          <label className="label" htmlFor="compare-from">Compare the current version (v{to}) with</label>
          <select id="compare-from" className="field py-1" value={from} onChange={(e) => setFrom(Number(e.target.value))}>
            {data.versions.filter((v) => v.version !== to).map((v) => <option key={v.version} value={v.version}>v{v.version} (effective {formatDate(v.effectiveDate)})</option>)}
          </select>
          {compare.data && (
            compare.data.changes.length === 0 ? <p className="mt-2 text-sm text-tin">No figure changed.</p> : (
              <table className="mt-2 w-full text-xs" data-testid="rate-changes">
                <thead className="text-left text-tin"><tr><th className="py-1">Figure</th><th className="py-1 text-right">v{from}</th><th className="py-1 text-right">v{to}</th></tr></thead>
                <tbody>
                  {compare.data.changes.map((c) => (
                    <tr key={c.key} className="border-t border-tin-rule"><td className="py-1 pr-2">{c.label}</td><td className="py-1 text-right num">{c.from} {c.unit}</td><td className="py-1 text-right num font-semibold">{c.to} {c.unit}</td></tr>
                  ))}
                </tbody>
              </table>
            )
          )}
        </div>
      )}
    </section>
  );
}

export function RateBookEditor({ initial }: { initial: RateSetRead }) {
  const qc = useQueryClient();
  const query = useQuery({ queryKey: quoteKeys.rateSet(initial.set.id), queryFn: () => quoteApi.getRateSet(initial.set.id), initialData: initial });
  const data = query.data;
  const defaults = useMemo(() => formValues(data), [data]);
  const form = useForm<Form>({ resolver, defaultValues: defaults, mode: "onSubmit", reValidateMode: "onChange" });
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const watched = useWatch({ control: form.control, name: "rates.currency" as "rates" });
  const currency = typeof watched === "string" && watched ? watched : data.current.rates.currency;
  const refresh = async () => {
    const fresh = await qc.fetchQuery({ queryKey: quoteKeys.rateSet(data.set.id), queryFn: () => quoteApi.getRateSet(data.set.id) });
    form.reset(formValues(fresh));
  };
  const save = useMutation({
    mutationFn: (v: Form) => quoteApi.saveRates(data.set.id, { version: data.set.version, effectiveDate: v.effectiveDate, note: v.note, rates: v.rates }),
    onSuccess: (saved) => {
      qc.setQueryData(quoteKeys.rateSet(data.set.id), saved);
      form.reset(formValues(saved));
      setNotice({ ok: true, text: `Saved as version ${saved.savedVersion}. New quotations are priced with it; issued ones keep their own rates.` });
    },
    onError: (err) => {
      if (err instanceof ApiError) {
        for (const [path, messages] of Object.entries(err.fields ?? {})) {
          if (path.startsWith("rates.") || path === "effectiveDate" || path === "note") form.setError(path as "note", { type: "server", message: messages.join(" ") });
        }
        setNotice({ ok: false, text: err.message });
      } else setNotice({ ok: false, text: "The rates could not be saved." });
    },
  });
  const current = useMutation({ mutationFn: () => quoteApi.makeCurrent(data.set.id), onSuccess: (r) => qc.setQueryData(quoteKeys.rateSet(data.set.id), r) });
  const errorCount = Object.keys(form.formState.errors).length ? rateBookFields.filter((f) => errorAt(form.formState.errors, f.key)).length : 0;
  return (
    <div className="grid gap-5 xl:grid-cols-[1fr_24rem]">
      <form noValidate aria-label="Rates" className="min-w-0 space-y-4" onSubmit={form.handleSubmit((v) => { setNotice(null); save.mutate(v); }, () => setNotice({ ok: false, text: "Some rates are not valid; they are marked below. Nothing was saved." }))}>
        <div className="flex flex-wrap items-end gap-3">
          <div className="min-w-0 flex-1">
            <h1 className="text-3xl font-semibold" data-testid="rate-set-name">{data.set.name}</h1>
            <p className="text-sm text-ink-soft">
              Version <span data-testid="rate-set-version">{data.set.version}</span>, effective {formatDate(data.current.effectiveDate)}
              {data.set.isCurrent ? <span className="ml-2 whitespace-nowrap rounded border border-fit/40 bg-fit-light px-1.5 text-xs text-fit">✓ current set</span> : (
                <button type="button" className="btn ml-2 py-0.5 text-xs" onClick={() => current.mutate()} disabled={current.isPending}>Make this the current set</button>
              )}
            </p>
          </div>
          <a className="btn" href={`/api/rate-sets/${data.set.id}/csv`}>Export CSV</a>
        </div>
        <div className="panel grid gap-3 p-4 sm:grid-cols-[12rem_1fr_auto] sm:items-end">
          <Field id="effective-date" label="Effective from" error={form.formState.errors.effectiveDate?.message}><input id="effective-date" type="date" className="field" {...form.register("effectiveDate")} /></Field>
          <Field id="version-note" label="What changed (kept with the version)" error={form.formState.errors.note?.message}><input id="version-note" className="field" placeholder="e.g. voicing rate from 1 January" {...form.register("note")} /></Field>
          <button type="submit" className="btn-primary" disabled={save.isPending}>{save.isPending ? "Saving…" : `Save as version ${data.set.version + 1}`}</button>
          {(notice || errorCount > 0) && (
            <p role="status" className={`flex items-center gap-1.5 text-sm sm:col-span-3 ${notice?.ok ? "text-fit" : "text-clash"}`} data-testid="rates-notice">
              <StateMark kind={notice?.ok ? "saved" : "clash"} />
              {notice?.text}{errorCount > 0 && !notice?.ok ? ` ${errorCount} ${errorCount === 1 ? "rate needs" : "rates need"} attention.` : ""}
            </p>
          )}
          {save.error instanceof ApiError && save.error.code === "conflict" && (
            <button type="button" className="btn sm:col-span-3" onClick={() => { setNotice(null); void refresh(); }}>Load their version (your changes here are discarded)</button>
          )}
        </div>
        <Section
          node={{ type: "group", key: "general", label: "General", children: rateBookTree.children.filter((c) => c.type === "field") }}
          depth={0}
          register={form.register}
          errors={form.formState.errors}
          currency={currency}
        />
        {rateBookTree.children.map((node) =>
          node.type === "group" ? <Section key={node.key} node={node} depth={0} register={form.register} errors={form.formState.errors} currency={currency} /> : null,
        )}
      </form>
      <aside className="space-y-4">
        <ComparePanel data={data} />
        <ImportPanel setId={data.set.id} version={data.set.version} onSaved={() => void refresh()} />
      </aside>
    </div>
  );
}
