import { queueImport } from "@/db/queries/imports";
import { getCommunityById } from "@/db/queries/records";
import { apiRoute, idParam } from "@/lib/auth/route";
import { readUploadedFile } from "@/lib/http/body";

/**
 * Upload a lots file (multipart field "file"): kept and queued (202); a worker validates,
 * computes and saves it, with progress on GET /api/imports/:id.
 */
export const POST = apiRoute<{ communityId: string }>(
  { permission: "lots.edit" },
  async ({ db, member, params, request }) => {
    const communityId = idParam(params.communityId, "That community");
    await getCommunityById({ db, accountId: member.accountId, communityId });
    const { fileName, data } = await readUploadedFile(request);
    const { importId } = await queueImport({
      db,
      accountId: member.accountId,
      userId: member.userId,
      kind: "lots",
      communityId,
      fileName,
      data,
    });
    return Response.json({ importId }, { status: 202 });
  },
);
