import { getSchemeForUser } from "@/db/queries/schemes";
import { pipeTable, pipeTableCsv, pipeTablesCsv } from "@/lib/drawing/pipe-table";
import { planDocument } from "@/lib/drawing/scheme-plan";
import { parseDrawingUnits } from "@/lib/drawing/units";
import { AppError } from "@/lib/server/errors";
import { route } from "@/lib/server/guard";
import { schemeParams } from "@/lib/server/params";
import { firmRates } from "@/lib/server/rates";
import { drawingRules } from "@/lib/spec/estimate";

const safeName = (name: string) => name.normalize("NFKD").replace(/[^\w\- ]+/g, "").trim().replace(/\s+/g, "-").slice(0, 60) || "pipes";

/**
 * A stop's pipe table as CSV (`?stop=ID`), or every stop's (`?stop=all`), in the firm's units or
 * `?units=mm|in`. The pipe shop's and the estimator's reading, not the committee's: estimate:read.
 */
export const GET = route({ permission: "estimate:read", params: schemeParams }, async ({ user, params, url }) => {
  const scheme = await getSchemeForUser({ user, schemeId: params.schemeId });
  const stopId = url.searchParams.get("stop") ?? "all";
  // A stop id longer than any the scheme model admits names no stop; it is not looked for.
  if (stopId.length > 200) throw new AppError("not_found", "This scheme has no such stop; it may have been removed since the page was opened.");
  const rates = await firmRates();
  const units = parseDrawingUnits(url.searchParams.get("units")?.slice(0, 10) ?? null, rates.drawingUnits);
  const planned = planDocument(scheme.document, scheme.tuning);
  if (!planned.ok) throw new AppError("invalid", `The pipes cannot be listed until the scheme is complete: ${planned.messages[0]}`, { stop: [...planned.messages] });
  const rules = drawingRules(rates);
  let body: string;
  let name: string;
  if (stopId === "all") {
    const tables = planned.plan.stops.map((sp) => pipeTable(planned.scheme, sp.stop.id, rules, planned.plan));
    body = pipeTablesCsv(tables, units);
    name = `${safeName(scheme.name)}-pipes.csv`;
  } else {
    const sp = planned.plan.stops.find((s) => s.stop.id === stopId);
    if (!sp) throw new AppError("not_found", "This scheme has no such stop; it may have been removed since the page was opened.");
    body = pipeTableCsv(pipeTable(planned.scheme, stopId, rules, planned.plan), units);
    name = `${safeName(scheme.name)}-${safeName(`${planned.plan.divisions[sp.divisionIndex].division.name} ${sp.stop.name}`)}-pipes.csv`;
  }
  return new Response(body, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${name}"; filename*=UTF-8''${encodeURIComponent(name)}`,
      "cache-control": "private, no-store",
    },
  });
});
