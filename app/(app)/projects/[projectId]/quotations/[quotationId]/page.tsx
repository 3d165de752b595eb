import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getQuotationForUser } from "@/db/queries/quotations";
import { can } from "@/lib/roles";
import { mayReadQuotation } from "@/lib/quote/access";
import { AppError } from "@/lib/server/errors";
import { requirePageUser } from "@/lib/server/guard";
import { QuotationEditor } from "./quotation-editor";

export const metadata: Metadata = { title: "Quotation" };

export default async function QuotationPage({ params }: { params: Promise<{ projectId: string; quotationId: string }> }) {
  const { projectId, quotationId } = await params;
  const user = await requirePageUser("projects:read", `/projects/${projectId}/quotations/${quotationId}`);
  if (!mayReadQuotation(user.role)) notFound();
  let quotation;
  try {
    quotation = await getQuotationForUser({ user, quotationId });
  } catch (err) {
    if (err instanceof AppError && (err.code === "not_found" || err.code === "forbidden")) notFound();
    if (err instanceof AppError && (err.code === "invalid" || err.code === "conflict")) {
      return (
        <div className="panel mx-auto max-w-2xl p-4">
          <h1 className="text-2xl font-semibold">This quotation cannot be priced</h1>
          <p className="mt-2 text-sm text-ink-soft">{err.message}</p>
          <ul className="mt-2 list-disc pl-5 text-sm text-clash">{Object.values(err.fields ?? {}).flat().map((m, i) => <li key={i}>{m}</li>)}</ul>
          <Link href={`/projects/${projectId}`} className="btn mt-3">Back to the project</Link>
        </div>
      );
    }
    throw err;
  }
  if (quotation.projectId !== projectId) notFound();
  return <QuotationEditor initial={quotation} mayIssue={can(user.role, "quotes:issue")} projectName={quotation.quotation.client.projectName} />;
}
