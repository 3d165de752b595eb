import "server-only";
import { asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { firms, type Firm } from "@/db/schema";
import { svgToPng } from "@/lib/documents/assets";
import type { FirmDetails } from "@/lib/quote/quotation";
import { AppError } from "@/lib/server/errors";
import type { z } from "zod";
import type { saveFirmSchema } from "@/lib/validation/firm";

/** The firm's one row; a new installation gets an empty one to fill in. */
export async function getFirm(): Promise<Firm> {
  const [row] = await db.select().from(firms).orderBy(asc(firms.createdAt)).limit(1);
  if (row) return row;
  const [created] = await db.insert(firms).values({ name: "" }).returning();
  return created!;
}

export function firmDetailsOf(f: Firm): FirmDetails {
  return {
    name: f.name, address: f.address, email: f.email, phone: f.phone, website: f.website, registration: f.registration,
    logo: f.logoPng && f.logoWidth && f.logoHeight ? { png: f.logoPng, width: f.logoWidth, height: f.logoHeight } : null,
  };
}

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/** A PNG's pixel size from its header (IHDR: width and height as big-endian 32-bit numbers at bytes 16 and 20). */
export function pngSize(buf: Buffer): { width: number; height: number } | null {
  if (buf.length < 24 || !buf.subarray(0, 8).equals(PNG_SIGNATURE) || buf.toString("ascii", 12, 16) !== "IHDR") return null;
  return { width: buf.readUInt32BE(16), height: buf.readUInt32BE(20) };
}

/** A logo file to the PNG the documents use: PNG as sent, SVG drawn at 800 px wide (no scripts or links survive). */
async function logoPng(type: "image/png" | "image/svg+xml", base64: string): Promise<{ png: string; width: number; height: number }> {
  const buf = Buffer.from(base64, "base64");
  const bad = (m: string) => new AppError("invalid", m, { "logo.base64": [m] });
  if (type === "image/png") {
    const size = pngSize(buf);
    if (!size || size.width < 1 || size.height < 1 || size.width > 4000 || size.height > 4000) throw bad("The file is not a PNG image of at most 4000 × 4000 pixels.");
    return { png: buf.toString("base64"), ...size };
  }
  const text = buf.toString("utf8");
  if (!/<svg[\s>]/i.test(text)) throw bad("The file is not an SVG drawing.");
  try {
    const r = await svgToPng(text, 800);
    return { png: r.png.toString("base64"), width: r.width, height: r.height };
  } catch {
    throw bad("The SVG drawing could not be read; save it again from the drawing program, or send a PNG.");
  }
}

export async function saveFirm({ input }: { input: z.output<typeof saveFirmSchema> }): Promise<Firm> {
  const current = await getFirm();
  const logo = input.logo.kind === "upload" ? await logoPng(input.logo.type, input.logo.base64) : null;
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(firms).where(eq(firms.id, current.id)).for("update");
    if (row!.version !== input.version) {
      throw new AppError("conflict", `Someone saved the firm's details after you opened them (version ${row!.version}); reload to see their change.`, undefined, { current: row });
    }
    const [updated] = await tx
      .update(firms)
      .set({
        ...input.details,
        ...(input.logo.kind === "remove" ? { logoPng: null, logoWidth: null, logoHeight: null } : {}),
        ...(logo ? { logoPng: logo.png, logoWidth: logo.width, logoHeight: logo.height } : {}),
        version: row!.version + 1,
        updatedAt: new Date(),
      })
      .where(eq(firms.id, current.id))
      .returning();
    return updated!;
  });
}
