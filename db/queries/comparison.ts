import "server-only";
import { db } from "@/db/client";
import { loadDocument } from "@/db/scheme-store";
import { can } from "@/lib/roles";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";
import { firmRates } from "@/lib/server/rates";
import { compareDocuments, costOfChanges, MAX_COMPARED, MIN_COMPARED, type ChangeCost, type ComparedScheme, type ComparisonView } from "@/lib/spec/comparison";
import type { Tuning } from "@/lib/spec/document";
import { loadProjectFor, loadSchemeFor } from "./access";

/** "a,b,c" from the address → two to four distinct scheme ids, or a 422 that says what is wrong. */
export function parseSchemeIds(raw: string | null): string[] {
  const ids = [...new Set((raw ?? "").split(",").map((s) => s.trim()).filter(Boolean))];
  if (ids.length < MIN_COMPARED || ids.length > MAX_COMPARED) {
    throw new AppError("invalid", `Choose between ${MIN_COMPARED} and ${MAX_COMPARED} different schemes to compare.`, { schemes: [`Choose ${MIN_COMPARED} to ${MAX_COMPARED} schemes.`] });
  }
  return ids;
}

/** The schemes in the order asked for, each checked like any scheme read (a client's unshared or foreign scheme is 404). */
async function loadCompared({ user, projectId, schemeIds }: { user: SessionUser; projectId: string; schemeIds: string[] }): Promise<{ tuning: Tuning; schemes: ComparedScheme[] }> {
  const project = await loadProjectFor({ user, projectId });
  // One snapshot: a save landing between two reads cannot give a half-old scheme.
  const schemes = await db.transaction(
    async (tx) =>
      Promise.all(
        schemeIds.map(async (schemeId) => {
          const { scheme } = await loadSchemeFor({ user, schemeId, tx });
          if (scheme.projectId !== projectId) throw new AppError("not_found", "No such scheme.");
          return { id: scheme.id, name: scheme.name, version: scheme.version, document: await loadDocument(tx, scheme) };
        }),
      ),
    { isolationLevel: "repeatable read", accessMode: "read only" },
  );
  return { tuning: { pitchHz: project.pitchHz, temperatureC: project.temperatureC }, schemes };
}

export async function getComparisonForUser({ user, projectId, schemeIds }: { user: SessionUser; projectId: string; schemeIds: string[] }): Promise<ComparisonView> {
  const { tuning, schemes } = await loadCompared({ user, projectId, schemeIds });
  return compareDocuments({ schemes, tuning, rates: await firmRates(), access: { money: can(user.role, "money:read"), hours: can(user.role, "estimate:read") } });
}

/** For the firm (money:read): the cost of each stop change of every scheme against the first. */
export async function getChangeCostsForUser({ user, projectId, schemeIds }: { user: SessionUser; projectId: string; schemeIds: string[] }): Promise<{ schemeId: string; changes: ChangeCost[] }[]> {
  if (!can(user.role, "money:read")) throw new AppError("forbidden", "Money is not shown to this role.");
  const { tuning, schemes } = await loadCompared({ user, projectId, schemeIds });
  const [base, ...others] = schemes;
  const rates = await firmRates();
  return others.map((o) => ({ schemeId: o.id, changes: costOfChanges({ base: base!.document, other: o.document, tuning, rates }) }));
}
