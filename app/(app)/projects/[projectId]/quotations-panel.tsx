"use client";
import { useMutation, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { PhoneLabel, phoneTable } from "@/components/ui/phone-table";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError } from "@/components/spec/api";
import { quoteApi, quoteKeys } from "@/components/quote/api";
import { QuoteStatusBadge } from "@/components/quote/status";
import { formatDate } from "@/components/spec/format";
import type { QuotationSummary } from "@/db/queries/quotations";
import { currencySymbol } from "@/lib/quote/currency";
import { formatAmount } from "@/lib/quote/totals";

type Props = {
  projectId: string;
  initial: QuotationSummary[];
  schemes: { id: string; name: string }[];
  rateSets: { id: string; name: string; isCurrent: boolean }[];
  mayIssue: boolean;
  mayRead: boolean;
  role: string;
};

function NewQuotationForm({ projectId, schemes, rateSets }: Pick<Props, "projectId" | "schemes" | "rateSets">) {
  const router = useRouter();
  const [schemeId, setSchemeId] = useState(schemes[0]?.id ?? "");
  const [rateSetId, setRateSetId] = useState(rateSets.find((r) => r.isCurrent)?.id ?? "");
  const [error, setError] = useState<string[] | null>(null);
  const create = useMutation({
    mutationFn: () => quoteApi.createQuotation(projectId, { schemeId, rateSetId: rateSetId || null }),
    onSuccess: ({ quotation }) => router.push(`/projects/${projectId}/quotations/${quotation.id}`),
    onError: (err) => setError(err instanceof ApiError ? [err.message, ...Object.values(err.fields ?? {}).flat()] : ["The quotation could not be made."]),
  });
  if (!schemes.length) return <p className="border-t border-tin-rule px-4 py-3 text-sm text-tin">Make a scheme first; a quotation prices one scheme.</p>;
  return (
    <form aria-label="Price a scheme" noValidate className="grid gap-2 border-t border-tin-rule px-4 py-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end" onSubmit={(e) => { e.preventDefault(); setError(null); create.mutate(); }}>
      <div>
        <label className="label" htmlFor="quote-scheme">Price the scheme</label>
        <select id="quote-scheme" className="field" value={schemeId} onChange={(e) => setSchemeId(e.target.value)}>
          {schemes.map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
        </select>
      </div>
      <div>
        <label className="label" htmlFor="quote-rates">with the rate set</label>
        <select id="quote-rates" className="field" value={rateSetId} onChange={(e) => setRateSetId(e.target.value)}>
          {rateSets.map((r) => <option key={r.id} value={r.id}>{r.name}{r.isCurrent ? " (current)" : ""}</option>)}
        </select>
      </div>
      <button type="submit" className="btn-primary" disabled={create.isPending}>{create.isPending ? "Pricing…" : "New quotation"}</button>
      {error && <ul role="alert" className="field-error list-disc pl-5 sm:col-span-3">{error.slice(0, 8).map((m, i) => <li key={i}>{m}</li>)}</ul>}
    </form>
  );
}

/** The project's quotations: the firm sees them all and prices schemes; the workshop sees issued ones for their work lists; a committee member sees the tenders sent to them. */
export function QuotationsPanel({ projectId, initial, schemes, rateSets, mayIssue, mayRead, role }: Props) {
  const { data } = useQuery({ queryKey: quoteKeys.quotations(projectId), queryFn: () => quoteApi.listQuotations(projectId).then((r) => r.quotations), initialData: initial });
  const title = role === "client" ? "Tenders sent to you" : "Quotations";
  return (
    <section className="panel" aria-labelledby="quotations-heading">
      <h2 id="quotations-heading" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">{title}</h2>
      {data.length === 0 ? (
        <p className="px-4 py-3 text-sm text-tin">{role === "client" ? "No tender has been sent to you yet." : "No quotations yet."}</p>
      ) : (
        <div className="relative overflow-x-auto">
          <table className={phoneTable.table} data-testid="quotations-table">
            <thead className={phoneTable.head}>
              <tr>
                <th className="px-4 py-2">Number</th><th className="px-4 py-2">Scheme</th><th className="px-4 py-2">State</th>
                {(mayRead || role === "client") && <th className="px-4 py-2 text-right">Total</th>}
                <th className="px-4 py-2">Valid until</th><th className="px-4 py-2"><span className="sr-only">Documents</span></th>
              </tr>
            </thead>
            <tbody className={phoneTable.body}>
              {data.map((q) => (
                <tr key={q.id} className={phoneTable.row} data-testid={`quotation-${q.number}`}>
                  <td className={`${phoneTable.cell} whitespace-nowrap num font-medium`}>
                    {mayRead ? <Link href={`/projects/${projectId}/quotations/${q.id}`} className="underline decoration-tin-rule underline-offset-2 hover:decoration-brass">{q.number}</Link> : q.number}
                  </td>
                  <td className={`${phoneTable.cell} sm:min-w-[9rem]`}>{q.schemeName} <span className="text-xs text-tin">v{q.schemeVersion}</span></td>
                  <td className={phoneTable.cell}><QuoteStatusBadge status={q.status} />{mayRead && q.sentAt && <span className="ml-2 text-xs text-tin">sent {formatDate(q.sentAt)}</span>}</td>
                  {(mayRead || role === "client") && <td className={`${phoneTable.cell} whitespace-nowrap sm:text-right num`}><PhoneLabel>Total</PhoneLabel><span data-testid="quotation-total">{q.totalAmount ? `${currencySymbol(q.currency)}${formatAmount(q.totalAmount)}` : "–"}</span></td>}
                  <td className={`${phoneTable.cell} whitespace-nowrap num`}><PhoneLabel>Valid until</PhoneLabel>{formatDate(q.validUntil)}</td>
                  <td className={`${phoneTable.cell} whitespace-nowrap sm:text-right`}>
                    {(mayRead || role === "client") && <a className="btn py-1 text-xs" href={`/api/quotations/${q.id}/documents/tender`}>Tender (.docx)</a>}
                    {role === "workshop" && <a className="btn py-1 text-xs" href={`/api/quotations/${q.id}/documents/work-list`}>Work list (.docx)</a>}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {mayIssue && <NewQuotationForm projectId={projectId} schemes={schemes} rateSets={rateSets} />}
    </section>
  );
}
