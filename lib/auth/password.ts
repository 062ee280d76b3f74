/** bcryptjs hashing (cost 10). No `server-only`: the seed script uses it. */
import bcrypt from "bcryptjs";

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, 10);
}

export function verifyPassword(password: string, hash: string | null): Promise<boolean> {
  // Compare against a fixed dummy hash when there is none, so timing does not reveal the account.
  return bcrypt.compare(password, hash ?? "$2b$10$CwTycUXWue0Thq9StjUM0uJ8.y3zJ7bVqYQj1Rjv0b9Jv9C3xW6e2");
}
