import { clearPreference, getOwnPreference, recordPreference } from "@/db/queries/preferences";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";
import { preferenceSchema } from "@/lib/spec/committee";

/** A committee member's own preferred scheme in this project. */
export const GET = route({ permission: "preferences:record", params: uuidParams("projectId") }, async ({ user, params }) => ({
  preference: await getOwnPreference({ user, projectId: params.projectId }),
}));

export const PUT = route({ permission: "preferences:record", params: uuidParams("projectId"), body: preferenceSchema }, async ({ user, params, body }) => ({
  preference: await recordPreference({ user, projectId: params.projectId, schemeId: body.schemeId, note: body.note }),
}));

export const DELETE = route({ permission: "preferences:record", params: uuidParams("projectId") }, async ({ user, params }) => {
  await clearPreference({ user, projectId: params.projectId });
  return { preference: null };
});
