import Link from "next/link";
import { formatDate, formatNumber } from "@/components/spec/format";
import { StopList } from "@/components/spec/stop-list";
import { StateMark } from "@/components/ui/state-mark";
import { currencySymbol } from "@/lib/quote/currency";
import { formatAmount } from "@/lib/quote/totals";
import type { SchemeRead } from "@/lib/spec/document";

/** The figures the firm shares with its client's committee: counts and weeks, and the price of a tender sent to them; never hours, rates or costs. */
export type HeadlineFigures = {
  tender: { number: string; totalAmount: string; currency: string; validUntil: string | null; status: string } | null;
  stops: number;
  ranks: number;
  pipes: { total: number; new: number; reused: number; restored: number };
  weeks: number;
  chests: { name: string; fits: boolean | null }[];
};

/** A shared scheme as the committee reads it: headline figures, the stop list, and whether each chest fits its case. */
export function CommitteeScheme({ scheme, projectName, clientName, figures }: { scheme: SchemeRead; projectName: string; clientName: string; figures: HeadlineFigures | null }) {
  const doc = scheme.document;
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3 print:hidden">
        <div className="min-w-0 flex-1">
          <nav aria-label="Breadcrumb" className="text-xs text-tin">
            <Link href="/projects" className="hover:text-ink">Projects</Link> <span aria-hidden="true">/</span>{" "}
            <Link href={`/projects/${scheme.projectId}`} className="hover:text-ink">{projectName}</Link> <span aria-hidden="true">/</span>
          </nav>
          <h1 className="text-2xl font-semibold" data-testid="scheme-name">{doc.name}</h1>
        </div>
        <Link className="btn-primary" href={`/projects/${scheme.projectId}/compare`}>Compare schemes</Link>
        <Link className="btn" href={`/projects/${scheme.projectId}`}>Record your preference</Link>
      </div>
      {figures && (
        <section className="panel px-4 py-3" aria-labelledby="headline-heading" data-testid="headline-figures">
          <h2 id="headline-heading" className="sr-only">In figures</h2>
          <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4">
            <div><dt className="text-xs text-tin">Stops</dt><dd className="num text-xl font-semibold">{formatNumber(figures.stops)}</dd></div>
            <div><dt className="text-xs text-tin">Ranks</dt><dd className="num text-xl font-semibold">{formatNumber(figures.ranks)}</dd></div>
            <div>
              <dt className="text-xs text-tin">Pipes</dt>
              <dd className="num text-xl font-semibold">{formatNumber(figures.pipes.total)}</dd>
              <dd className="text-xs text-ink-soft">{formatNumber(figures.pipes.new)} new · {formatNumber(figures.pipes.restored)} restored · {formatNumber(figures.pipes.reused)} reused</dd>
            </div>
            <div><dt className="text-xs text-tin">Programme</dt><dd className="num text-xl font-semibold">{formatNumber(figures.weeks, 1)} weeks</dd></div>
          </dl>
          {figures.tender && (
            <p className="mt-3 border-t border-tin-rule pt-2 text-sm" data-testid="tender-price">
              Tender <span className="num">{figures.tender.number}</span>:{" "}
              <span className="num text-lg font-semibold">{currencySymbol(figures.tender.currency)}{formatAmount(figures.tender.totalAmount)}</span>
              {figures.tender.status === "lapsed" ? (
                <span className="text-caution"> — lapsed on {formatDate(figures.tender.validUntil)}; ask the firm for a new one.</span>
              ) : figures.tender.validUntil ? (
                <span className="text-ink-soft"> — valid until {formatDate(figures.tender.validUntil)}. Options are priced apart; see the tender on the project page.</span>
              ) : null}
            </p>
          )}
          <ul className="mt-3 flex flex-wrap gap-x-4 gap-y-1 text-xs" aria-label="Chest space">
            {figures.chests.map((c) => (
              <li key={c.name} className={`flex items-center gap-1 ${c.fits === false ? "font-semibold text-clash" : c.fits ? "text-fit" : "text-tin"}`}>
                <StateMark kind={c.fits === null ? "unknown" : c.fits ? "fit" : "clash"} />
                {c.name}: {c.fits === null ? "no space given" : c.fits ? "fits the case" : "does not fit the case as drawn"}
              </li>
            ))}
          </ul>
          {figures.chests.some((c) => c.fits === false) && (
            <p className="mt-2 max-w-3xl text-xs text-ink-soft" data-testid="fit-explained">
              &ldquo;Does not fit&rdquo; means the pipes of that division, as the scheme stands, need more room than the
              space measured in the case. It is a question for the design, not a fault in the organ: the builder can
              enlarge the chest, move some pipes elsewhere or change the scheme, and will say which before a tender.
            </p>
          )}
        </section>
      )}
      <article className="bg-paper-card px-6 py-6 shadow-sm print:bg-white print:p-0 print:shadow-none">
        <header className="mb-6 border-b border-ink pb-3 text-center font-serif">
          <p className="text-sm uppercase tracking-[0.2em] text-ink-soft">{clientName}</p>
          <h2 className="mt-1 text-3xl font-semibold">{doc.name}</h2>
          {doc.description && <p className="mx-auto mt-1 max-w-2xl text-sm italic text-ink-soft">{doc.description}</p>}
          <p className="mt-1 text-xs text-tin">{projectName} · version {scheme.version} · {formatDate(scheme.updatedAt)}</p>
        </header>
        <StopList doc={doc} />
      </article>
    </div>
  );
}
