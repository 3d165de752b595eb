import { inviteToCommittee, listInvitations } from "@/db/queries/committee";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";
import { inviteSchema } from "@/lib/spec/committee";

export const GET = route({ permission: "committee:manage", params: uuidParams("projectId") }, async ({ user, params }) => ({
  invitations: await listInvitations({ user, projectId: params.projectId }),
}));

/** Invites by e-mail; an existing committee account is added at once ({ kind: "added" }). */
export const POST = route({ permission: "committee:manage", params: uuidParams("projectId"), body: inviteSchema }, async ({ user, params, body }) =>
  inviteToCommittee({ user, projectId: params.projectId, email: body.email, name: body.name }),
);
