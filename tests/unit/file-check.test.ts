import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { inspectFile, THUMBNAIL_PX } from "@/lib/server/file-check";

const MB = 1_000_000;
const image = (format: "jpeg" | "png" | "webp", w = 800, h = 600) => sharp({ create: { width: w, height: h, channels: 3, background: "#7a5230" } }).toFormat(format).toBuffer();

/** CRC-32 as PNG chunks use it (ISO 3309; PNG specification, section 5.5). */
function crc32(bytes: Buffer): number {
  let c = ~0;
  for (const b of bytes) {
    c ^= b;
    for (let k = 0; k < 8; k++) c = c & 1 ? (c >>> 1) ^ 0xedb88320 : c >>> 1;
  }
  return ~c >>> 0;
}

/** Rewrites a PNG's IHDR width and height (bytes 16–23 after the 8-byte signature and chunk header) and its CRC. */
function withPngSize(png: Buffer, width: number, height: number): Buffer {
  const out = Buffer.from(png);
  out.writeUInt32BE(width, 16);
  out.writeUInt32BE(height, 20);
  out.writeUInt32BE(crc32(out.subarray(12, 29)), 29);
  return out;
}

describe("inspectFile", () => {
  it.each(["jpeg", "png", "webp"] as const)("keeps a %s photo and makes a thumbnail that fits the thumbnail square", async (format) => {
    const name = `photo.${format === "jpeg" ? "jpg" : format}`;
    const r = await inspectFile(name, await image(format, 1600, 900), 25 * MB);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r).toMatchObject({ type: `image/${format}`, width: 1600, height: 900 });
    const thumb = await sharp(r.thumbnail!).metadata();
    expect([thumb.format, thumb.width, thumb.height]).toEqual(["jpeg", THUMBNAIL_PX, 270]);
  });

  it("reads width and height as people see them when the camera turned the picture (EXIF orientation 6)", async () => {
    const turned = await sharp({ create: { width: 400, height: 300, channels: 3, background: "#1d2433" } }).jpeg().withMetadata({ orientation: 6 }).toBuffer();
    const r = await inspectFile("turned.jpg", turned, 25 * MB);
    expect(r.ok && [r.width, r.height]).toEqual([300, 400]);
  });

  it("goes by the content, not the name: a PNG named .jpg and text named .webp are refused", async () => {
    const png = await inspectFile("photo.jpg", await image("png"), 25 * MB);
    expect(!png.ok && png.message).toMatch(/is a PNG image by its content, but its name says JPEG photo; rename it to end in \.png/);
    const text = await inspectFile("photo.webp", Buffer.from("<html><script>alert(1)</script></html>"), 25 * MB);
    expect(!text.ok && text.message).toMatch(/is not a JPEG photo, PNG image, WebP photo or PDF by its content/);
  });

  it("refuses a small file that claims a huge picture (a decompression bomb) and a damaged one", async () => {
    // A 64 × 64 PNG whose header claims 20 000 × 20 000 pixels: a few hundred bytes that would decode to 1.2 GB.
    const bomb = withPngSize(await image("png", 64, 64), 20000, 20000);
    expect(bomb.length).toBeLessThan(2 * MB);
    const r = await inspectFile("bomb.png", bomb, 25 * MB);
    expect(!r.ok && r.message).toMatch(/cannot be read as a picture \(damaged, or over 120 million pixels\)/);
    const jpeg = await image("jpeg");
    const cut = await inspectFile("cut.jpg", jpeg.subarray(0, 200), 25 * MB);
    expect(cut.ok).toBe(false);
  });

  it("refuses a file over the size limit before reading it", async () => {
    const r = await inspectFile("big.jpg", Buffer.alloc(2 * MB + 1), 2 * MB);
    expect(!r.ok && r.message).toBe('"big.jpg" is 2.0 MB; files up to 2.0 MB are kept. Make it smaller (e.g. export the photo at a lower resolution) and try again.');
  });
});
