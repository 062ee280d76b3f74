/** Write an audit event: who (actor) did what (action) to which record (target), with details. */
import "@/lib/db/sequelize"; // initialises the models in this bundle (see lib/db/sequelize.ts)
import { AuditEvent } from "@/models";
import type { Transaction } from "sequelize";

export async function audit(
  e: { teamId: number; actorId: number | null; action: string; target: string; detail?: unknown },
  transaction?: Transaction,
): Promise<void> {
  await AuditEvent.create(
    { teamId: e.teamId, actorId: e.actorId, action: e.action, target: e.target, detail: e.detail === undefined ? null : JSON.stringify(e.detail) },
    { transaction },
  );
}
