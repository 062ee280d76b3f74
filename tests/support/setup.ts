/**
 * Vitest setup, run before each test file: a temporary SQLite file of its own (removed
 * afterwards, so WAL and the busy timeout are exercised as in production), a test session
 * secret, and `next/headers` replaced by an in-memory cookie jar that tests can switch.
 */
import os from "node:os";
import path from "node:path";
import fs from "node:fs";
import crypto from "node:crypto";
import { afterAll, vi } from "vitest";

const file = path.join(os.tmpdir(), `gybe-test-${process.pid}-${crypto.randomBytes(4).toString("hex")}.sqlite`);
process.env.DB_FILE = file;
process.env.SESSION_SECRET = "unit-test-secret-that-is-long-enough-1234";

vi.mock("next/headers", async () => {
  const { currentJar } = await import("./cookie-jar");
  return {
    cookies: async () => {
      const jar = currentJar();
      return {
        get: (name: string) => (jar.has(name) ? { name, value: jar.get(name)! } : undefined),
        getAll: () => [...jar.entries()].map(([name, value]) => ({ name, value })),
        has: (name: string) => jar.has(name),
        set: (name: string, value: string, opts?: { maxAge?: number }) => {
          if (opts?.maxAge === 0 || value === "") jar.delete(name);
          else jar.set(name, value);
        },
        delete: (name: string) => jar.delete(name),
      };
    },
    headers: async () => new Headers(),
  };
});

afterAll(async () => {
  try {
    const { sequelize } = await import("@/lib/db/sequelize");
    await sequelize.close();
  } catch {
    // the file never opened the database
  }
  for (const f of [file, `${file}-wal`, `${file}-shm`]) fs.rmSync(f, { force: true });
});
