import type { Metadata } from "next";
import Link from "next/link";
import { listRateSets } from "@/db/queries/rate-sets";
import { formatDate } from "@/components/spec/format";
import { requirePageUser } from "@/lib/server/guard";
import { NewRateSetForm } from "../new-rate-set-form";

export const metadata: Metadata = { title: "Rate book" };

export default async function RatesPage() {
  await requirePageUser("rates:manage", "/rates");
  const sets = await listRateSets();
  return (
    <div className="space-y-5">
      <div>
        <h1 className="text-3xl font-semibold">Rate book</h1>
        <p className="text-ink-soft">The firm&rsquo;s hourly rates, material prices, labour norms and percentages. Schemes are priced with the current set unless a quotation names another; every saved change is a new version.</p>
      </div>
      <section className="panel overflow-x-auto">
        <table className="w-full text-sm" data-testid="rate-sets">
          <thead className="text-left text-xs uppercase tracking-wide text-tin">
            <tr><th className="px-4 py-2">Rate set</th><th className="px-4 py-2">Version</th><th className="px-4 py-2">Effective</th><th className="px-4 py-2">Currency</th><th className="px-4 py-2">Provenance</th></tr>
          </thead>
          <tbody>
            {sets.map((s) => (
              <tr key={s.id} className="border-t border-tin-rule">
                <td className="px-4 py-2">
                  <Link href={`/rates/${s.id}`} className="font-medium underline decoration-tin-rule underline-offset-2 hover:decoration-brass">{s.name}</Link>
                  {s.isCurrent && <span className="ml-2 rounded border border-fit/40 bg-fit-light px-1.5 text-xs text-fit">✓ current</span>}
                </td>
                <td className="px-4 py-2 num">v{s.version}</td>
                <td className="px-4 py-2 num">{formatDate(s.effectiveDate)}</td>
                <td className="px-4 py-2">{s.currency}</td>
                <td className="px-4 py-2 text-xs text-ink-soft">{s.provenance}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
      <section className="panel max-w-2xl p-4">
        <h2 className="mb-2 text-xl font-semibold">New rate set</h2>
        <NewRateSetForm sets={sets.map((s) => ({ id: s.id, name: s.name, isCurrent: s.isCurrent }))} />
      </section>
    </div>
  );
}
