import { clearPreference, getOwnPreference, recordPreference } from "@/db/queries/preferences";
import { route } from "@/lib/server/guard";
import { preferenceSchema } from "@/lib/spec/committee";

type Params = { projectId: string };

/** A committee member's own preferred scheme in this project. */
export const GET = route<undefined, Params>({ permission: "preferences:record" }, async ({ user, params }) => ({
  preference: await getOwnPreference({ user, projectId: params.projectId }),
}));

export const PUT = route<typeof preferenceSchema, Params>({ permission: "preferences:record", body: preferenceSchema }, async ({ user, params, body }) => ({
  preference: await recordPreference({ user, projectId: params.projectId, schemeId: body.schemeId, note: body.note }),
}));

export const DELETE = route<undefined, Params>({ permission: "preferences:record" }, async ({ user, params }) => {
  await clearPreference({ user, projectId: params.projectId });
  return { preference: null };
});
