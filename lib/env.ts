/**
 * Validated process environment. No `server-only`: instrumentation.ts and scripts import it.
 *
 * SESSION_SECRET (≥ 32 characters) seals the session cookie. When it is missing or short, the
 * secret the demo generated in data/.session-secret is used if present; otherwise the server
 * refuses to start with a message saying what to set.
 */
import fs from "node:fs";
import path from "node:path";

export const DEMO_SECRET_FILE = path.join(process.cwd(), "data", ".session-secret");

export class ConfigError extends Error {}

export function sessionSecret(): string {
  const fromEnv = process.env.SESSION_SECRET;
  if (fromEnv && fromEnv.length >= 32) return fromEnv;
  try {
    const fromFile = fs.readFileSync(DEMO_SECRET_FILE, "utf8").trim();
    if (fromFile.length >= 32) return fromFile;
  } catch {
    // no demo secret: fall through to the error below
  }
  throw new ConfigError(
    fromEnv
      ? `SESSION_SECRET is too short (${fromEnv.length} characters): it must be at least 32 characters. ` +
          `Generate one with: node -e "console.log(require('crypto').randomBytes(32).toString('hex'))"`
      : "SESSION_SECRET is not set: set it to a random string of at least 32 characters " +
          `(node -e "console.log(require('crypto').randomBytes(32).toString('hex'))"), or run \`npm run demo\`, ` +
          "which generates one in data/.session-secret.",
  );
}

/** Public base URL used in e-mailed links (invitations). */
export function appUrl(): string {
  return (process.env.APP_URL ?? "http://localhost:3000").replace(/\/+$/, "");
}
