"use client";
import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { quoteApi, quoteKeys } from "@/components/quote/api";
import { formatDate } from "@/components/spec/format";
import type { QuotationSummary } from "@/db/queries/quotations";
import { useOwnPreference, useProject } from "@/lib/query/hooks";
import { roleLabels, type Role } from "@/lib/roles";
import { committeeNextSteps } from "@/lib/spec/next-steps";
import { projectStatusLabels } from "@/lib/spec/projects";
import { MyPreference } from "./preferences";
import { SchemesList } from "./schemes-list";

/** What a committee member may know of the firm: how to reach it (as on the tender's cover). */
export type FirmContact = { name: string; email: string; phone: string; website: string };

/**
 * A committee member's page for their project: where things stand and what comes next, the schemes
 * shared with them, their preference, the tenders sent to them, and who is who.
 */
export function CommitteeProjectView({ projectId, selfId, firm, tenders: initialTenders, children }: { projectId: string; selfId: string; firm: FirmContact; tenders: QuotationSummary[]; children?: React.ReactNode }) {
  const { data } = useProject(projectId);
  const own = useOwnPreference(projectId);
  const tenders = useQuery({ queryKey: quoteKeys.quotations(projectId), queryFn: () => quoteApi.listQuotations(projectId).then((r) => r.quotations), initialData: initialTenders });
  if (!data) return null;
  const { project, schemes } = data;
  const firmPeople = project.members.filter((m) => m.role !== "client");
  const committee = project.members.filter((m) => m.role === "client");
  const next = committeeNextSteps({
    status: project.status,
    firmName: firm.name,
    sharedSchemes: schemes.map((s) => s.name),
    tenders: tenders.data,
    hasPreference: !!own.data,
    formatDate,
  });

  return (
    <div className="space-y-6">
      <div>
        <nav aria-label="Breadcrumb" className="text-xs text-tin">
          <Link href="/projects" className="hover:text-ink">Projects</Link> <span aria-hidden="true">/</span>
        </nav>
        <h1 className="text-3xl font-semibold" data-testid="project-name">{project.name}</h1>
        <p className="text-ink-soft">
          {[project.venue, project.location].filter(Boolean).join(", ") || project.clientName}
          <span className="ml-2 rounded border border-tin-rule px-1.5 text-xs text-tin" data-testid="project-status">Stage: {projectStatusLabels[project.status]}</span>
        </p>
      </div>

      <section className="panel border-l-4 border-l-brass p-4" aria-labelledby="next-heading" data-testid="next-steps">
        <h2 id="next-heading" className="mb-2 text-xl font-semibold">What happens next</h2>
        <p className="text-base" data-testid="next-now">{next.now}</p>
        <ol className="mt-2 list-decimal space-y-1 pl-5 text-sm text-ink-soft">
          {next.steps.map((s) => <li key={s}>{s}</li>)}
        </ol>
      </section>

      <div className="grid grid-cols-1 gap-6 xl:grid-cols-[1fr_22rem]">
        <div className="min-w-0 space-y-6">
          {schemes.length > 0 ? (
            <SchemesList projectId={project.id} schemes={schemes} mayEdit={false} clientView />
          ) : (
            <section className="panel p-4" aria-labelledby="schemes-heading">
              <h2 id="schemes-heading" className="mb-1 text-xl font-semibold">Schemes shared with the committee</h2>
              <p className="text-sm text-tin">No scheme has been shared with you yet.</p>
            </section>
          )}
          {schemes.length > 0 && <MyPreference projectId={project.id} schemes={schemes} />}
          {children}
        </div>
        <div className="space-y-6">
          <section className="panel" aria-labelledby="firm-people-heading">
            <h2 id="firm-people-heading" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">The firm&apos;s people on this project</h2>
            <ul className="divide-y divide-tin-rule text-sm" data-testid="firm-people">
              {firmPeople.map((m) => (
                <li key={m.id} className="px-4 py-2">
                  <bdi className="block font-medium">{m.name}</bdi>
                  <span className="block text-xs text-tin">{roleLabels[m.role as Role] ?? m.role}</span>
                </li>
              ))}
              {firmPeople.length === 0 && <li className="px-4 py-2 text-tin">The firm has not named its people yet.</li>}
            </ul>
          </section>
          <section className="panel" aria-labelledby="committee-heading">
            <h2 id="committee-heading" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">Your committee</h2>
            <ul className="divide-y divide-tin-rule text-sm" data-testid="committee-people">
              {committee.map((m) => (
                <li key={m.id} className="px-4 py-2">
                  <bdi className="font-medium">{m.name}</bdi>
                  {m.id === selfId && <span className="ml-1 text-xs text-tin">(you)</span>}
                </li>
              ))}
            </ul>
          </section>
          {(firm.name || firm.email || firm.phone) && (
            <section className="panel p-4 text-sm" aria-labelledby="contact-heading" data-testid="firm-contact">
              <h2 id="contact-heading" className="mb-2 text-xl font-semibold">Contact</h2>
              {firm.name && <p className="font-medium">{firm.name}</p>}
              <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
                {firm.email && <><dt className="text-tin">E-mail</dt><dd className="min-w-0 break-words"><a className="underline decoration-tin-rule underline-offset-2 hover:decoration-brass" href={`mailto:${firm.email}`}>{firm.email}</a></dd></>}
                {firm.phone && <><dt className="text-tin">Telephone</dt><dd className="num">{firm.phone}</dd></>}
                {firm.website && <><dt className="text-tin">Website</dt><dd className="min-w-0 break-words">{firm.website}</dd></>}
              </dl>
            </section>
          )}
        </div>
      </div>
    </div>
  );
}
