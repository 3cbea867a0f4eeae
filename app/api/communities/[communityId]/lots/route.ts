import { editLots, listLotsForGrid, type LotChange } from "@/db/queries/lots";
import { apiRoute, idParam, parseJsonBody } from "@/lib/auth/route";
import { AppError, type FieldError } from "@/lib/errors";
import { parseFacing } from "@/lib/workbook/facing";
import { lotEditSchema } from "./schema";

export const GET = apiRoute<{ communityId: string }>({ permission: "read" }, async ({ db, member, params }) =>
  listLotsForGrid({
    db,
    accountId: member.accountId,
    communityId: idParam(params.communityId, "That community"),
  }),
);

/** Edits lots in place (one, or many for a bulk set of plan or facing) and recomputes them. */
export const PATCH = apiRoute<{ communityId: string }>(
  { permission: "lots.edit" },
  async ({ db, member, params, request }) => {
    const { changes } = await parseJsonBody(request, lotEditSchema);
    const errors: FieldError[] = [];
    const parsed: LotChange[] = changes.map(({ facing, ...rest }, index) => {
      if (facing === undefined) return rest;
      const read = parseFacing(facing);
      if (!read.ok) {
        errors.push({
          field: `changes.${index}.facing`,
          row: rest.lotId,
          column: "Facing",
          message: `Facing ${read.reason}`,
        });
        return rest;
      }
      return { ...rest, facingDeg: read.deg };
    });
    if (errors.length > 0)
      throw new AppError("invalid_input", "Some facings are not valid; nothing was saved.", errors);
    return editLots({
      db,
      accountId: member.accountId,
      userId: member.userId,
      communityId: idParam(params.communityId, "That community"),
      changes: parsed,
    });
  },
);
