/**
 * Node-only start-up (imported by instrumentation.ts under the nodejs runtime): refuse to start
 * without a usable session secret, then apply pending migrations.
 */
import { sessionSecret, ConfigError } from "./env";
import { migrateUp } from "./db/migrator";

export async function startServer(): Promise<void> {
  try {
    sessionSecret();
  } catch (err) {
    if (err instanceof ConfigError) {
      console.error(`\n[gybe] cannot start: ${err.message}\n`);
      process.exit(1);
    }
    throw err;
  }
  const applied = await migrateUp();
  if (applied.length) console.log(`[gybe] migrations applied: ${applied.join(", ")}`);
}
