import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";

const megabytes = (bytes: number) => `${Number((bytes / 1048576).toFixed(1))} MB`;

/**
 * Reads a request body up to `maxBytes`, counting while it streams in: a declared length over the
 * limit is refused before a byte is read, and a chunked body (no Content-Length) is cut off as
 * soon as it passes the limit, never buffered whole. Over the limit is a 413.
 */
export async function readBodyLimited(request: Request, maxBytes: number, what: string): Promise<Uint8Array> {
  const declared = request.headers.get("content-length");
  if (declared !== null && Number(declared) > maxBytes) throw tooLarge(what, maxBytes);
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge(what, maxBytes);
    }
    chunks.push(value);
  }
  const body = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    body.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return body;
}

function tooLarge(what: string, maxBytes: number) {
  return new AppError(
    "payload_too_large",
    `${what} is larger than ${megabytes(maxBytes)}, the limit. Nothing was saved.`,
  );
}

/** The small limit of every JSON (and sign-in form) body. */
export function jsonBodyLimit(): number {
  return env().PLATLOAD_MAX_JSON_BYTES;
}

/** Room for the multipart boundaries and headers around the one file of an upload. */
const MULTIPART_OVERHEAD_BYTES = 64 * 1024;

/**
 * The one file of an import upload (multipart field "file"), read under the one upload limit
 * (PLATLOAD_MAX_UPLOAD_BYTES) while it streams in.
 */
export async function readUploadedFile(request: Request): Promise<{ fileName: string; data: Uint8Array }> {
  const maxBytes = env().PLATLOAD_MAX_UPLOAD_BYTES;
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data")) throw noFile();
  let body: Uint8Array;
  try {
    body = await readBodyLimited(request, maxBytes + MULTIPART_OVERHEAD_BYTES, "The upload");
  } catch (error) {
    // Name the upload limit itself, not the room left for the multipart wrapping.
    if (error instanceof AppError && error.code === "payload_too_large")
      throw tooLarge("The upload", maxBytes);
    throw error;
  }
  const form = await new Response(body as BodyInit, { headers: { "content-type": type } })
    .formData()
    .catch(() => null);
  const file = form?.get("file");
  if (!file || typeof file === "string") throw noFile();
  if (file.size > maxBytes) throw tooLarge(`The file "${file.name}"`, maxBytes);
  return { fileName: file.name, data: new Uint8Array(await file.arrayBuffer()) };
}

function noFile() {
  return new AppError("invalid_input", "Choose a .csv or .xlsx file to import.", [
    { field: "file", message: "No file" },
  ]);
}
