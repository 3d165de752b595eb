import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getRateSet } from "@/db/queries/rate-sets";
import { AppError } from "@/lib/server/errors";
import { requirePageUser } from "@/lib/server/guard";
import { RateBookEditor } from "./rate-book-editor";

export const metadata: Metadata = { title: "Rate set" };

export default async function RateSetPage({ params }: { params: Promise<{ rateSetId: string }> }) {
  const { rateSetId } = await params;
  await requirePageUser("rates:manage", `/rates/${rateSetId}`);
  let data;
  try {
    data = await getRateSet({ rateSetId });
  } catch (err) {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  }
  return (
    <div className="space-y-4">
      <nav aria-label="Breadcrumb" className="text-xs text-tin"><Link href="/rates" className="hover:text-ink">Rate book</Link> <span aria-hidden="true">/</span></nav>
      <RateBookEditor initial={data} />
    </div>
  );
}
