import { requireApiUser } from "@/lib/auth/dal";
import { updateMember } from "@/lib/db/queries/team-admin";
import { handle, idParam, json, parseJson } from "@/lib/server/http";
import { memberPatchSchema } from "@/lib/validation/team-work";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ userId: string }> };

/** Change `{ role?, active? }` of a member (lead only). The team's last active lead stays a lead (409). */
export const PATCH = handle<Ctx>(async (req, { params }) => {
  const user = await requireApiUser("team:manage");
  const id = idParam((await params).userId, "Member");
  const input = await parseJson(req, memberPatchSchema, 10_000);
  return json(await updateMember(user, id, input));
});
