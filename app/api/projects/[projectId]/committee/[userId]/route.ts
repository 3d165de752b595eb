import { removeCommitteeMember } from "@/db/queries/committee";
import { route } from "@/lib/server/guard";

export const DELETE = route<undefined, { projectId: string; userId: string }>({ permission: "committee:manage" }, async ({ user, params }) => {
  await removeCommitteeMember({ user, projectId: params.projectId, userId: params.userId });
  return { ok: true };
});
