import { requireApiUser } from "@/lib/auth/dal";
import { deleteComment } from "@/lib/db/queries/comments";
import { handle, idParam, json } from "@/lib/server/http";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ id: string; commentId: string }> };

/** Delete a comment (its author or a lead). */
export const DELETE = handle<Ctx>(async (_req, { params }) => {
  const user = await requireApiUser("tour:read");
  const p = await params;
  await deleteComment(user, idParam(p.id, "Tour"), idParam(p.commentId, "Comment"));
  return json({ ok: true });
});
