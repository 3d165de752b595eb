import { createRateSet, listRateSets } from "@/db/queries/rate-sets";
import { route } from "@/lib/server/guard";
import { newRateSetSchema } from "@/lib/validation/rate-sets";

export const GET = route({ permission: "rates:manage" }, async () => ({ rateSets: await listRateSets() }));

export const POST = route({ permission: "rates:manage", body: newRateSetSchema }, async ({ user, body }) => {
  const set = await createRateSet({ user, name: body.name, copyFrom: body.copyFrom ?? null });
  return Response.json({ rateSet: { id: set.id, name: set.name } }, { status: 201 });
});
