import "server-only";
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { env } from "@/lib/env";

// Uploaded files and generated packets live in object storage (S3 API). Here a local fake on
// loopback; in production a real bucket, from the environment.
const globalForS3 = globalThis as unknown as { platloadS3?: S3Client };

function client(): S3Client {
  if (!globalForS3.platloadS3) {
    const e = env();
    globalForS3.platloadS3 = new S3Client({
      region: e.S3_REGION,
      endpoint: e.S3_ENDPOINT,
      forcePathStyle: e.S3_FORCE_PATH_STYLE === "true",
      credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
    });
  }
  return globalForS3.platloadS3;
}

export async function putObject({
  key,
  body,
  contentType,
}: {
  key: string;
  body: Uint8Array | string;
  contentType: string;
}): Promise<void> {
  await client().send(
    new PutObjectCommand({ Bucket: env().S3_BUCKET, Key: key, Body: body, ContentType: contentType }),
  );
}

export async function getObject(key: string): Promise<Uint8Array> {
  const result = await client().send(new GetObjectCommand({ Bucket: env().S3_BUCKET, Key: key }));
  if (!result.Body) throw new Error(`object ${key} has no body`);
  return result.Body.transformToByteArray();
}

/** Removes an object; removing one that is already gone is not an error (S3 answers 204 either way). */
export async function deleteObject(key: string): Promise<void> {
  await client().send(new DeleteObjectCommand({ Bucket: env().S3_BUCKET, Key: key }));
}

/** A key that says what the file is and cannot collide: account/kind/date/random-name. */
export function objectKey({
  accountId,
  kind,
  fileName,
}: {
  accountId: number;
  kind: string;
  fileName: string;
}): string {
  const safe = fileName.replace(/[^A-Za-z0-9._-]+/g, "-").slice(-120);
  return `accounts/${accountId}/${kind}/${new Date().toISOString().slice(0, 10)}/${crypto.randomUUID()}-${safe}`;
}
