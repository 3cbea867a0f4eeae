import { CATALOG_IMPORT_MAX_BYTES, importCatalog } from "@/db/queries/equipment";
import { apiRoute } from "@/lib/auth/route";
import { AppError } from "@/lib/errors";

/** Upload an equipment catalog file (multipart field "file"): all or nothing. */
export const POST = apiRoute({ permission: "equipment.edit" }, async ({ db, member, request }) => {
  const declared = Number(request.headers.get("content-length") ?? 0);
  if (declared > CATALOG_IMPORT_MAX_BYTES + 64 * 1024) throw new AppError("payload_too_large", `The file is larger than ${CATALOG_IMPORT_MAX_BYTES / 1048576} MB; nothing was imported.`);
  const form = await request.formData().catch(() => null);
  const file = form?.get("file");
  if (!file || typeof file === "string") throw new AppError("invalid_input", "Choose a .csv or .xlsx file to import.", [{ field: "file", message: "No file" }]);
  return importCatalog({ db, accountId: member.accountId, userId: member.userId, fileName: file.name, data: new Uint8Array(await file.arrayBuffer()) });
});
