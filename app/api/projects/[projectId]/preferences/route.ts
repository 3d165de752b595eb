import { summarisePreferences } from "@/db/queries/preferences";
import { route } from "@/lib/server/guard";

/** For the firm: who on the committee prefers which scheme, and when they said so. */
export const GET = route<undefined, { projectId: string }>({ permission: "preferences:read" }, async ({ user, params }) => ({
  summary: await summarisePreferences({ user, projectId: params.projectId }),
}));
