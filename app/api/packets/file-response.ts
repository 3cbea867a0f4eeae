/** A generated or stored file as a response: its type, its name, never cached. */
export function fileResponse(
  file: { fileName: string; contentType: string; body: Uint8Array },
  disposition: "inline" | "attachment",
): Response {
  const safeName = file.fileName.replace(/[^A-Za-z0-9._-]+/g, "-");
  const body = file.body.buffer.slice(
    file.body.byteOffset,
    file.body.byteOffset + file.body.byteLength,
  ) as ArrayBuffer;
  return new Response(body, {
    headers: {
      "content-type": file.contentType,
      "content-disposition": `${disposition}; filename="${safeName}"`,
      "content-length": String(file.body.byteLength),
      "cache-control": "no-store",
      "x-content-type-options": "nosniff",
    },
  });
}
