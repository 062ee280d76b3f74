/**
 * Sign-in with a per-address throttle: five failed tries lock the address for 15 minutes,
 * whether or not it belongs to a user (rows exist for unknown addresses too), and a success
 * resets the count. Messages never reveal whether the address exists.
 */
import "server-only";
import "@/lib/db/sequelize"; // initialises the models in this bundle (see lib/db/sequelize.ts)
import { SignInThrottle, User } from "@/models";
import { verifyPassword } from "./password";
import { HttpError } from "@/lib/server/http";
import { audit } from "@/lib/db/audit";

export const MAX_FAILURES = 5;
export const LOCK_MS = 15 * 60 * 1000;

const INVALID = "That e-mail and password do not match an active account.";

function lockedError(until: Date, now: Date): HttpError {
  const minutes = Math.max(1, Math.ceil((until.getTime() - now.getTime()) / 60000));
  return new HttpError(
    429,
    "locked",
    `Too many failed sign-ins for this address. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`,
  );
}

/** Check the credentials; returns the user id, or throws 401 (wrong) / 429 (locked). */
export async function checkCredentials(emailRaw: string, password: string, now = new Date()): Promise<number> {
  const email = emailRaw.trim().toLowerCase();
  const [throttle] = await SignInThrottle.findOrCreate({ where: { email }, defaults: { email, failures: 0, lockedUntil: null } });
  if (throttle.lockedUntil && throttle.lockedUntil > now) throw lockedError(throttle.lockedUntil, now);
  if (throttle.lockedUntil && throttle.lockedUntil <= now) {
    throttle.lockedUntil = null;
    throttle.failures = 0;
  }
  const user = await User.findOne({ where: { email } });
  const ok = await verifyPassword(password, user?.passwordHash ?? null);
  if (!ok || !user || !user.active) {
    throttle.failures += 1;
    if (throttle.failures >= MAX_FAILURES) {
      throttle.lockedUntil = new Date(now.getTime() + LOCK_MS);
      throttle.failures = 0;
      if (user) await audit({ teamId: user.teamId as number, actorId: null, action: "sign_in.locked", target: `user:${user.id}` });
    }
    await throttle.save();
    throw new HttpError(401, "invalid_credentials", INVALID);
  }
  throttle.failures = 0;
  throttle.lockedUntil = null;
  await throttle.save();
  return user.id;
}
