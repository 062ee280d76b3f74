import { requireApiUser } from "@/lib/auth/dal";
import { listOutbox } from "@/lib/db/queries/team";
import { handle, json } from "@/lib/server/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Messages the mailer sent for the team (lead only). */
export const GET = handle(async () => {
  const user = await requireApiUser("team:manage");
  return json(await listOutbox(user));
});
