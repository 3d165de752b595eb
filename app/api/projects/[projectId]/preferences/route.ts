import { summarisePreferences } from "@/db/queries/preferences";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";

/** For the firm: who on the committee prefers which scheme, and when they said so. */
export const GET = route({ permission: "preferences:read", params: uuidParams("projectId") }, async ({ user, params }) => ({
  summary: await summarisePreferences({ user, projectId: params.projectId }),
}));
