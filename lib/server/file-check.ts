/**
 * Checks an uploaded file by its bytes, never by its name or what the browser claimed: its size,
 * its real type (file-type reads the signature at the start of the content), that the name agrees
 * with the content, and for images that they decode; then makes the thumbnail (sharp).
 */
import { fileTypeFromBuffer } from "file-type";
import sharp from "sharp";
import { acceptedTypeList, acceptedTypes, formatBytes, typeForName, type AcceptedType } from "@/lib/files/kinds";

/** Thumbnails fit a 480 px square: sharp on a phone screen at 2×, small enough for a gallery page. */
export const THUMBNAIL_PX = 480;
/** Larger than any camera's photo (a 100 MP medium-format frame); a small file claiming more is a decompression bomb. */
const MAX_PIXELS = 120_000_000;

export type Inspected =
  | { ok: true; type: AcceptedType; width: number | null; height: number | null; thumbnail: Buffer | null }
  | { ok: false; message: string };

const names = acceptedTypeList.map((t) => acceptedTypes[t].label);
const ACCEPTED_WORDS = `${names.slice(0, -1).join(", ")} or ${names.at(-1)}`;

export function sizeProblem(name: string, size: number, maxBytes: number): string | null {
  if (size <= 0) return `"${name}" is empty; nothing was kept.`;
  if (size > maxBytes) return `"${name}" is ${formatBytes(size)}; files up to ${formatBytes(maxBytes)} are kept. Make it smaller (e.g. export the photo at a lower resolution) and try again.`;
  return null;
}

export async function inspectFile(name: string, bytes: Buffer, maxBytes: number): Promise<Inspected> {
  const tooBig = sizeProblem(name, bytes.length, maxBytes);
  if (tooBig) return { ok: false, message: tooBig };
  const sniffed = await fileTypeFromBuffer(bytes);
  const real = sniffed && (acceptedTypeList as string[]).includes(sniffed.mime) ? (sniffed.mime as AcceptedType) : null;
  if (!real) return { ok: false, message: `"${name}" is not a ${ACCEPTED_WORDS} by its content, whatever its name says; nothing was kept.` };
  const claimed = typeForName(name);
  if (claimed !== real) {
    const ext = acceptedTypes[real].extensions[0];
    return {
      ok: false,
      message: `"${name}" is a ${acceptedTypes[real].label} by its content, but its name says ${claimed ? acceptedTypes[claimed].label : "something else"}; rename it to end in .${ext} if that is what it is, and try again. Nothing was kept.`,
    };
  }
  if (!acceptedTypes[real].image) return { ok: true, type: real, width: null, height: null, thumbnail: null };
  try {
    const image = sharp(bytes, { limitInputPixels: MAX_PIXELS, failOn: "error" });
    const meta = await image.metadata();
    // EXIF orientations 5–8 turn the picture a quarter, so width and height swap as people see it.
    const turned = (meta.orientation ?? 1) >= 5;
    const thumbnail = await image
      .rotate()
      .resize(THUMBNAIL_PX, THUMBNAIL_PX, { fit: "inside", withoutEnlargement: true })
      .jpeg({ quality: 78, mozjpeg: true })
      .toBuffer();
    return { ok: true, type: real, width: (turned ? meta.height : meta.width) ?? null, height: (turned ? meta.width : meta.height) ?? null, thumbnail };
  } catch {
    return { ok: false, message: `"${name}" looks like a ${acceptedTypes[real].label} but cannot be read as a picture (damaged, or over ${MAX_PIXELS / 1e6} million pixels); nothing was kept.` };
  }
}
