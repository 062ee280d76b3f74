/** `npm run db:seed`: migrate, then seed the invented demo team when the database is empty. */
import { migrateUp } from "@/lib/db/migrator";
import { seedDemoIfEmpty } from "@/lib/db/seed";
import { sequelize } from "@/lib/db/sequelize";

async function main() {
  await migrateUp();
  console.log((await seedDemoIfEmpty()) ? "seeded the demo team" : "database already has data: nothing seeded");
  await sequelize.close();
}
main().catch((err) => {
  console.error(err);
  process.exit(1);
});
