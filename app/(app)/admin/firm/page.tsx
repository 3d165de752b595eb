import type { Metadata } from "next";
import { firmDetailsOf, getFirm } from "@/db/queries/firm";
import { requirePageUser } from "@/lib/server/guard";
import { FirmForm } from "./firm-form";

export const metadata: Metadata = { title: "Firm details" };

export default async function FirmPage() {
  await requirePageUser("firm:manage", "/admin/firm");
  const firm = await getFirm();
  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <div>
        <h1 className="text-3xl font-semibold">Firm details</h1>
        <p className="text-ink-soft">What the cover of every tender says about the firm: name, address, contact and logo.</p>
      </div>
      <section className="panel p-4">
        <FirmForm version={firm.version} details={firmDetailsOf(firm)} />
      </section>
    </div>
  );
}
