/**
 * Umzug over the static list in migrations/index.ts (a glob fails inside `next start`).
 * No `server-only`: instrumentation.ts and scripts/migrate.ts import this.
 */
import { Umzug, SequelizeStorage } from "umzug";
import type { QueryInterface } from "sequelize";
import { sequelize } from "./sequelize";
import { migrations } from "@/migrations";

export function createMigrator() {
  return new Umzug<QueryInterface>({
    migrations: migrations.map((m) => ({ name: m.name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: "schema_migrations" }),
    logger: undefined,
  });
}

export type Migrator = ReturnType<typeof createMigrator>;
export type Migration = Migrator["_types"]["migration"];

/** Apply every pending migration; returns the names applied. */
export async function migrateUp(): Promise<string[]> {
  const applied = await createMigrator().up();
  return applied.map((m) => m.name);
}

/** Revert migrations down to (not including) `to`, or the last one when omitted. */
export async function migrateDown(opts: { to?: string | 0 } = {}): Promise<string[]> {
  const reverted = await createMigrator().down(opts.to === undefined ? undefined : { to: opts.to });
  return reverted.map((m) => m.name);
}
