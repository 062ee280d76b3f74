/**
 * Runs once when the server starts (next start / next dev, not next build): checks the session
 * secret (a missing or short SESSION_SECRET stops the server with a clear message unless the
 * demo's generated secret exists) and applies pending database migrations.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { startServer } = await import("./lib/startup");
    await startServer();
  }
}
