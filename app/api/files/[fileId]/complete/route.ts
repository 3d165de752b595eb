import { completeUpload } from "@/db/queries/files";
import { route } from "@/lib/server/guard";

type Params = { fileId: string };

/** The bytes have been PUT to the upload link: check them, keep them (with a thumbnail) or delete them. */
export const POST = route<undefined, Params>({ permission: "files:write" }, async ({ user, params }) => ({
  file: await completeUpload({ user, fileId: params.fileId }),
}));
