import { firmDetailsOf, getFirm, saveFirm } from "@/db/queries/firm";
import { route } from "@/lib/server/guard";
import { saveFirmSchema } from "@/lib/validation/firm";

export const GET = route({ permission: "firm:manage" }, async () => {
  const firm = await getFirm();
  return { version: firm.version, details: firmDetailsOf(firm) };
});

export const PUT = route({ permission: "firm:manage", body: saveFirmSchema }, async ({ body }) => {
  const firm = await saveFirm({ input: body });
  return { version: firm.version, details: firmDetailsOf(firm) };
});
