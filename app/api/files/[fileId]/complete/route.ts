import { completeUpload } from "@/db/queries/files";
import { route } from "@/lib/server/guard";
import { fileParams } from "@/lib/server/params";

/** The bytes have been PUT to the upload link: check them, keep them (with a thumbnail) or delete them. */
export const POST = route({ permission: "files:write", params: fileParams }, async ({ user, params }) => ({
  file: await completeUpload({ user, fileId: params.fileId }),
}));
