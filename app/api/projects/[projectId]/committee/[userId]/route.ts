import { removeCommitteeMember } from "@/db/queries/committee";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";

export const DELETE = route({ permission: "committee:manage", params: uuidParams("projectId", "userId") }, async ({ user, params }) => {
  await removeCommitteeMember({ user, projectId: params.projectId, userId: params.userId });
  return { ok: true };
});
