import { getSchemeForUser } from "@/db/queries/schemes";
import { route } from "@/lib/server/guard";
import { schemeParams } from "@/lib/server/params";
import { toSchemeFile } from "@/lib/spec/scheme-file";
import { writeStopListCsv } from "@/lib/spec/stop-list-csv";

function fileName(name: string, ext: string) {
  const safe = name.normalize("NFKD").replace(/[^\w\- ]+/g, "").trim().replace(/\s+/g, "-").slice(0, 80) || "scheme";
  return `${safe}.${ext}`;
}

/** `?format=csv` the stop list for spreadsheets (docs/stop-list-csv.md); otherwise the scheme file (docs/scheme-format.md). */
export const GET = route({ permission: "schemes:read", params: schemeParams }, async ({ user, params, url }) => {
  const scheme = await getSchemeForUser({ user, schemeId: params.schemeId });
  const csv = url.searchParams.get("format") === "csv";
  const body = csv ? writeStopListCsv(scheme.document) : `${JSON.stringify(toSchemeFile(scheme.document, scheme.tuning), null, 2)}\n`;
  const name = fileName(scheme.name, csv ? "csv" : "json");
  return new Response(body, {
    headers: {
      "content-type": csv ? "text/csv; charset=utf-8" : "application/json; charset=utf-8",
      "content-disposition": `attachment; filename="${name}"; filename*=UTF-8''${encodeURIComponent(name)}`,
      "cache-control": "private, no-store",
    },
  });
});
