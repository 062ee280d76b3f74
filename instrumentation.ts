/**
 * Runs once when the server starts (next start / next dev, not next build): checks the session
 * secret (a missing or short SESSION_SECRET stops the server with a clear message unless the
 * demo's generated secret exists) and applies pending database migrations.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { sessionSecret, ConfigError } = await import("./lib/env");
  try {
    sessionSecret();
  } catch (err) {
    if (err instanceof ConfigError) {
      console.error(`\n[gybe] cannot start: ${err.message}\n`);
      process.exit(1);
    }
    throw err;
  }
  const { migrateUp } = await import("./lib/db/migrator");
  const applied = await migrateUp();
  if (applied.length) console.log(`[gybe] migrations applied: ${applied.join(", ")}`);
}
