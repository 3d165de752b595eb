import { withdrawInvitation } from "@/db/queries/committee";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";

export const DELETE = route({ permission: "committee:manage", params: uuidParams("invitationId") }, async ({ user, params }) => ({
  invitation: await withdrawInvitation({ user, invitationId: params.invitationId }),
}));
