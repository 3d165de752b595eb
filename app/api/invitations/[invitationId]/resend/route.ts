import { resendInvitation } from "@/db/queries/committee";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";

export const POST = route({ permission: "committee:manage", params: uuidParams("invitationId") }, async ({ user, params }) => ({
  invitation: await resendInvitation({ user, invitationId: params.invitationId }),
}));
