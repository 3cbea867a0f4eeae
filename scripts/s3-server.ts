// A local S3-compatible fake (s3rver) for development and tests, on loopback. Files live in the
// git-ignored data folder; the bucket is created on start.
import { mkdirSync } from "node:fs";
import path from "node:path";
import S3rver from "s3rver";

const port = Number(process.env.S3_FAKE_PORT ?? "3713");
const directory = process.env.S3_FAKE_DIR ?? path.resolve(".data/s3-demo");
const bucket = process.env.S3_BUCKET ?? "platload";
mkdirSync(directory, { recursive: true });

const server = new S3rver({
  port,
  address: "127.0.0.1",
  silent: true,
  directory,
  configureBuckets: [{ name: bucket, configs: [] }],
});

server
  .run()
  .then(() => console.log(`s3 fake listening on 127.0.0.1:${port}, bucket ${bucket}, files in ${directory}`))
  .catch((error: Error) => {
    console.error("s3 fake:", error.message);
    process.exit(1);
  });

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, () => {
    void server.close().finally(() => process.exit(0));
  });
}
