import { getSchemeJsonForUser, saveScheme, updateSchemeMeta } from "@/db/queries/schemes";
import { route } from "@/lib/server/guard";
import { DOCUMENT_BODY_LIMIT } from "@/lib/server/input";
import { schemeParams } from "@/lib/server/params";
import { revisionNumber, schemeMetaSchema } from "@/lib/spec/document";
import { z } from "zod";

export const GET = route({ permission: "schemes:read", params: schemeParams }, async ({ user, params }) =>
  new Response(await getSchemeJsonForUser({ user, schemeId: params.schemeId }), { headers: { "content-type": "application/json" } }),
);

// The document is validated by saveScheme, which words each problem with its division and stop.
const saveBody = z.object({ version: revisionNumber, document: z.unknown(), note: z.string().max(200).optional() });

export const PUT = route({ permission: "schemes:edit", params: schemeParams, body: saveBody, bodyLimit: DOCUMENT_BODY_LIMIT }, async ({ user, params, body }) => ({
  scheme: await saveScheme({ user, schemeId: params.schemeId, version: body.version, document: body.document, note: body.note }),
}));

export const PATCH = route({ permission: "schemes:edit", params: schemeParams, body: schemeMetaSchema }, async ({ user, params, body }) => ({
  scheme: await updateSchemeMeta({ user, schemeId: params.schemeId, ...body }),
}));
