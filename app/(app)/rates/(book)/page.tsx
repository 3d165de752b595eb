import type { Metadata } from "next";
import Link from "next/link";
import { listRateSets } from "@/db/queries/rate-sets";
import { formatDate } from "@/components/spec/format";
import { PhoneLabel, phoneTable } from "@/components/ui/phone-table";
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
      <section className="panel">
        <table className={phoneTable.table} data-testid="rate-sets">
          <thead className={phoneTable.head}>
            <tr><th className="px-4 py-2">Rate set</th><th className="px-4 py-2">Version</th><th className="px-4 py-2">Effective</th><th className="px-4 py-2">Currency</th><th className="px-4 py-2">Provenance</th></tr>
          </thead>
          <tbody className={phoneTable.body}>
            {sets.map((s) => (
              <tr key={s.id} className={phoneTable.row}>
                <td className={phoneTable.lead}>
                  <Link href={`/rates/${s.id}`} className="font-medium underline decoration-tin-rule underline-offset-2 hover:decoration-brass">{s.name}</Link>
                  {s.isCurrent && <span className="ml-2 whitespace-nowrap rounded border border-fit/40 bg-fit-light px-1.5 text-xs text-fit">✓ current</span>}
                </td>
                <td className={`${phoneTable.cell} num`}><PhoneLabel>Version</PhoneLabel>v{s.version}</td>
                <td className={`${phoneTable.cell} num`}><PhoneLabel>Effective</PhoneLabel>{formatDate(s.effectiveDate)}</td>
                <td className={phoneTable.cell}>{s.currency}</td>
                <td className={`${phoneTable.cell} basis-full text-xs text-ink-soft`}>{s.provenance}</td>
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
