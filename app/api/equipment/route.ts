import { listEquipment } from "@/db/queries/records";
import { apiRoute } from "@/lib/auth/route";

export const GET = apiRoute({ permission: "read" }, async ({ db, member }) => ({ systems: await listEquipment({ db, accountId: member.accountId }) }));
