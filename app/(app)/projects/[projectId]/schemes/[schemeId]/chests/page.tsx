import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { requirePageUser } from "@/lib/server/guard";
import { figureSourceFor } from "@/lib/server/rates";
import { loadSchemePage } from "../load";
import { ChestsClient } from "./chests-client";

export const metadata: Metadata = { title: "Chests" };

export default async function ChestsPage({ params }: { params: Promise<{ projectId: string; schemeId: string }> }) {
  const { projectId, schemeId } = await params;
  const user = await requirePageUser("schemes:read", `/projects/${projectId}/schemes/${schemeId}/chests`);
  const { scheme } = await loadSchemePage(user, projectId, schemeId);
  // The committee reads the scheme's own page, which says whether each chest fits.
  if (user.role === "client") redirect(`/projects/${projectId}/schemes/${schemeId}`);
  return (
    <div className="space-y-4">
      <div className="flex items-center gap-3 print:hidden">
        <Link href={`/projects/${projectId}/schemes/${schemeId}`} className="btn">← Back to the editor</Link>
        <h1 className="text-2xl font-semibold">Chests of {scheme.document.name}</h1>
      </div>
      <ChestsClient document={scheme.document} tuning={scheme.tuning} source={await figureSourceFor(user, scheme)} />
    </div>
  );
}
