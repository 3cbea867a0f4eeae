import { queueImport } from "@/db/queries/imports";
import { apiRoute } from "@/lib/auth/route";
import { readUploadedFile } from "@/lib/http/body";

/** Upload an equipment catalog file (multipart field "file"): kept and queued (202); progress on GET /api/imports/:id. */
export const POST = apiRoute({ permission: "equipment.edit" }, async ({ db, member, request }) => {
  const { fileName, data } = await readUploadedFile(request);
  const { importId } = await queueImport({
    db,
    accountId: member.accountId,
    userId: member.userId,
    kind: "equipment",
    fileName,
    data,
  });
  return Response.json({ importId }, { status: 202 });
});
