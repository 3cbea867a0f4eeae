import { acceptInvitation, findOpenInvitation } from "@/db/queries/team";
import { parseJsonBody, publicRoute } from "@/lib/auth/route";
import { AppError } from "@/lib/errors";
import { acceptInvitationSchema } from "./schema";

export const GET = publicRoute<{ token: string }>(async ({ db, params }) => {
  const inv = await findOpenInvitation({ db, token: params.token });
  if (!inv)
    throw new AppError(
      "not_found",
      "This invitation link is not valid any more. Ask your admin for a new one.",
    );
  return { email: inv.email, name: inv.name, role: inv.role, accountName: inv.accountName };
});

export const POST = publicRoute<{ token: string }>(async ({ db, params, request }) => {
  // An unknown token is refused before the body is read (and long before any password is hashed).
  if (!(await findOpenInvitation({ db, token: params.token })))
    throw new AppError(
      "not_found",
      "This invitation link is not valid any more. Ask your admin for a new one.",
    );
  const body = await parseJsonBody(request, acceptInvitationSchema);
  return acceptInvitation({ db, token: params.token, ...body });
});
