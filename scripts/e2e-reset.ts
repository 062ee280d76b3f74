/** Playwright's webServer runs this first: delete the e2e database, migrate, seed two teams. */
import fs from "node:fs";
import path from "node:path";

async function main() {
  const file = path.resolve(process.env.DB_FILE ?? "data/e2e.sqlite");
  for (const f of [file, `${file}-wal`, `${file}-shm`, `${file}-journal`]) fs.rmSync(f, { force: true });
  process.env.DB_FILE = file;
  const { migrateUp } = await import("@/lib/db/migrator");
  const { seedE2E } = await import("@/lib/db/seed");
  const { sequelize } = await import("@/lib/db/sequelize");
  await migrateUp();
  await seedE2E();
  await sequelize.close();
  console.log(`[e2e] fresh database at ${file}`);
}
main().catch((err) => {
  console.error(err);
  process.exit(1);
});
