/**
 * `npm run demo` (after the build): generate a session secret for the demo when none is set,
 * migrate, seed the invented demo team when the database is empty, then start Gybe on port 3000.
 */
import fs from "node:fs";
import path from "node:path";
import crypto from "node:crypto";
import { spawn } from "node:child_process";

async function main() {
  const dataDir = path.join(process.cwd(), "data");
  fs.mkdirSync(dataDir, { recursive: true });
  const secretFile = path.join(dataDir, ".session-secret");
  if ((process.env.SESSION_SECRET ?? "").length < 32 && !fs.existsSync(secretFile)) {
    fs.writeFileSync(secretFile, crypto.randomBytes(32).toString("hex"), { mode: 0o600 });
    console.log("[demo] generated a session secret in data/.session-secret");
  }
  const { migrateUp } = await import("@/lib/db/migrator");
  const { seedDemoIfEmpty } = await import("@/lib/db/seed");
  const { sequelize } = await import("@/lib/db/sequelize");
  await migrateUp();
  if (await seedDemoIfEmpty()) console.log("[demo] seeded the invented demo team (sign-ins in README.md)");
  await sequelize.close();
  const port = process.env.PORT ?? "3000";
  console.log(`[demo] starting Gybe at http://localhost:${port}`);
  const child = spawn(path.join("node_modules", ".bin", "next"), ["start", "-p", port], { stdio: "inherit", env: process.env });
  const stop = () => child.kill("SIGTERM");
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
  child.on("exit", (code) => process.exit(code ?? 0));
}
main().catch((err) => {
  console.error(err);
  process.exit(1);
});
