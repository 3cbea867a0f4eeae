import { getDb } from "@/db";
import { processLotImport, receiveLotImport } from "@/db/queries/lot-import";
import { apiRoute, idParam } from "@/lib/auth/route";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { runAfterResponse } from "@/lib/http/background";

/**
 * Upload a lots file (multipart field "file"). The file is stored and the import recorded; it is
 * validated, computed and saved after the response (202), with progress on GET /api/imports/:id.
 */
export const POST = apiRoute<{ communityId: string }>({ permission: "lots.edit" }, async ({ db, member, params, request }) => {
  const maxBytes = env().PLATLOAD_MAX_UPLOAD_BYTES;
  const declared = Number(request.headers.get("content-length") ?? 0);
  if (declared > maxBytes + 64 * 1024) throw new AppError("payload_too_large", `The file is larger than ${(maxBytes / 1048576).toFixed(0)} MB, the upload limit. Nothing was imported.`);
  const form = await request.formData().catch(() => null);
  const file = form?.get("file");
  if (!file || typeof file === "string") throw new AppError("invalid_input", "Choose a .csv or .xlsx file to import.", [{ field: "file", message: "No file" }]);
  const data = new Uint8Array(await file.arrayBuffer());
  const { importId } = await receiveLotImport({ db, accountId: member.accountId, userId: member.userId, communityId: idParam(params.communityId, "That community"), fileName: file.name, data, maxBytes });
  runAfterResponse(() => processLotImport({ db: getDb(), importId, data }));
  return Response.json({ importId }, { status: 202 });
});
