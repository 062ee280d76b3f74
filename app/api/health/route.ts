import { sequelize } from "@/lib/db/sequelize";
import { json } from "@/lib/server/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Liveness and database reachability. */
export async function GET() {
  try {
    await sequelize.query("SELECT 1");
    return json({ ok: true, database: sequelize.getDialect() });
  } catch {
    return json({ ok: false, error: "database_unavailable", message: "The database cannot be reached." }, 503);
  }
}
