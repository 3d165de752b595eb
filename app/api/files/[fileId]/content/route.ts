import { fileContentLink } from "@/db/queries/files";
import { route } from "@/lib/server/guard";
import { fileParams } from "@/lib/server/params";

/**
 * The file's bytes: after the access check, a redirect to a signed link that lives a minute or so
 * (FILE_LINK_SECONDS). The app's own address is what pages keep; the signed one is never stored, so a
 * member removed from the project, or a committee member after the file is unshared, gets nothing.
 * `?variant=thumbnail` for an image's thumbnail, `?download=1` to save rather than open.
 */
export const GET = route({ permission: "files:read", params: fileParams }, async ({ user, params, url }) => {
  const link = await fileContentLink({
    user,
    fileId: params.fileId,
    variant: url.searchParams.get("variant") === "thumbnail" ? "thumbnail" : "original",
    attachment: url.searchParams.get("download") === "1",
  });
  return new Response(null, { status: 302, headers: { location: link, "cache-control": "private, no-store" } });
});
