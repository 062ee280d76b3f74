/** `npm run db:migrate` (apply pending) or `npm run db:migrate -- down` (revert the last one). */
import { migrateDown, migrateUp } from "@/lib/db/migrator";
import { dbFile, sequelize } from "@/lib/db/sequelize";

async function main() {
  const where = process.env.DATABASE_URL ? "DATABASE_URL" : dbFile;
  if (process.argv[2] === "down") {
    const names = await migrateDown();
    console.log(names.length ? `reverted: ${names.join(", ")} (${where})` : "nothing to revert");
  } else {
    const names = await migrateUp();
    console.log(names.length ? `applied: ${names.join(", ")} (${where})` : "nothing to migrate");
  }
  await sequelize.close();
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
