import { requireApiUser } from "@/lib/auth/dal";
import { revokeInvitation } from "@/lib/db/queries/team-admin";
import { handle, idParam, json } from "@/lib/server/http";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ invitationId: string }> };

/** Revoke a pending invitation (lead only): its link stops working. */
export const DELETE = handle<Ctx>(async (_req, { params }) => {
  const user = await requireApiUser("team:manage");
  await revokeInvitation(user, idParam((await params).invitationId, "Invitation"));
  return json({ ok: true });
});
