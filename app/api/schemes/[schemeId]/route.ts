import { getSchemeForUser, saveScheme, updateSchemeMeta } from "@/db/queries/schemes";
import { route } from "@/lib/server/guard";
import { schemeMetaSchema } from "@/lib/spec/document";
import { z } from "zod";

type Params = { schemeId: string };

export const GET = route<undefined, Params>({ permission: "schemes:read" }, async ({ user, params }) => ({
  scheme: await getSchemeForUser({ user, schemeId: params.schemeId }),
}));

// The document is validated by saveScheme, which words each problem with its division and stop.
const saveBody = z.object({ version: z.number().int().min(1), document: z.unknown(), note: z.string().max(200).optional() });

export const PUT = route<typeof saveBody, Params>({ permission: "schemes:edit", body: saveBody }, async ({ user, params, body }) => ({
  scheme: await saveScheme({ user, schemeId: params.schemeId, version: body.version, document: body.document, note: body.note }),
}));

export const PATCH = route<typeof schemeMetaSchema, Params>({ permission: "schemes:edit", body: schemeMetaSchema }, async ({ user, params, body }) => ({
  scheme: await updateSchemeMeta({ user, schemeId: params.schemeId, ...body }),
}));
