/**
 * Object storage through the AWS S3 SDK (v3): whatever S3-compatible service the settings name
 * (lib/env.ts). Not marked server-only so the seed script can store the demo's files with it; it
 * needs the server's settings and credentials, so no page ever imports it.
 */
import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { storageSettings } from "@/lib/env";

/** Upload links last long enough for a large file on a slow site connection (seconds). */
export const UPLOAD_LINK_SECONDS = 15 * 60;

/** Keys are the server's own: nothing a browser sends (name, type) ever becomes part of one. */
export const fileKeys = {
  uploadKey: (projectId: string, fileId: string) => `uploads/${projectId}/${fileId}`,
  originalKey: (projectId: string, fileId: string, ext: string) => `projects/${projectId}/files/${fileId}/original.${ext}`,
  thumbnailKey: (projectId: string, fileId: string) => `projects/${projectId}/files/${fileId}/thumbnail.jpg`,
};

let cached: { client: S3Client; bucket: string } | undefined;

function store() {
  if (!cached) {
    const s = storageSettings();
    cached = {
      bucket: s.bucket,
      client: new S3Client({ region: s.region, endpoint: s.endpoint, forcePathStyle: s.forcePathStyle, credentials: s.credentials }),
    };
  }
  return cached;
}

/** A link the browser PUTs the bytes to, for one key the server chose. */
export async function signedUploadUrl(key: string): Promise<string> {
  const { client, bucket } = store();
  return getSignedUrl(client, new PutObjectCommand({ Bucket: bucket, Key: key }), { expiresIn: UPLOAD_LINK_SECONDS });
}

/** A short-lived link to read one object; issue it only after the access check. */
export async function signedDownloadUrl(key: string, opts: { fileName: string; contentType: string; attachment: boolean }): Promise<string> {
  const { client, bucket } = store();
  const disposition = `${opts.attachment ? "attachment" : "inline"}; filename*=UTF-8''${encodeURIComponent(opts.fileName)}`;
  return getSignedUrl(
    client,
    new GetObjectCommand({ Bucket: bucket, Key: key, ResponseContentDisposition: disposition, ResponseContentType: opts.contentType }),
    { expiresIn: storageSettings().linkSeconds },
  );
}

/** The stored size in bytes, or null when there is no such object. */
export async function objectSize(key: string): Promise<number | null> {
  const { client, bucket } = store();
  try {
    const head = await client.send(new HeadObjectCommand({ Bucket: bucket, Key: key }));
    return head.ContentLength ?? 0;
  } catch (err) {
    if (isMissing(err)) return null;
    throw err;
  }
}

export async function readObject(key: string): Promise<Buffer> {
  const { client, bucket } = store();
  const res = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
  return Buffer.from(await res.Body!.transformToByteArray());
}

export async function writeObject(key: string, body: Buffer, contentType: string): Promise<void> {
  const { client, bucket } = store();
  await client.send(new PutObjectCommand({ Bucket: bucket, Key: key, Body: body, ContentType: contentType }));
}

/** Deleting what is not there is not an error (S3 answers the same either way). */
export async function deleteObject(key: string): Promise<void> {
  const { client, bucket } = store();
  await client.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
}

function isMissing(err: unknown): boolean {
  const e = err as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e?.name === "NotFound" || e?.name === "NoSuchKey" || e?.$metadata?.httpStatusCode === 404;
}
