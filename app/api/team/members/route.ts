import { requireApiUser } from "@/lib/auth/dal";
import { listMembers } from "@/lib/db/queries/team";
import { handle, json } from "@/lib/server/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** The members of the caller's team (any role may read: mentions and owners need names). */
export const GET = handle(async () => {
  const user = await requireApiUser("tour:read");
  return json(await listMembers(user));
});
