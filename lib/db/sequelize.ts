/**
 * The one Sequelize instance of the process (SQLite by default, `DATABASE_URL` when set).
 *
 * The instance is cached on globalThis so that every server bundle (instrumentation, each route)
 * shares one connection pool; the models are initialised on every evaluation of this module
 * (see STACK.md §7, failure 4), so each bundle's copy of the model classes is bound.
 * No `server-only` here: instrumentation.ts and the tsx scripts import this module.
 */
import path from "node:path";
import fs from "node:fs";
import { Sequelize } from "sequelize";
import sqlite3 from "sqlite3";
import { initModels } from "@/models";

/** The SQLite file: `DB_FILE` when set, else data/gybe.sqlite under the working directory. */
export const dbFile = process.env.DB_FILE
  ? path.resolve(process.env.DB_FILE)
  : path.join(process.cwd(), "data", "gybe.sqlite");

function createSequelize(): Sequelize {
  const url = process.env.DATABASE_URL;
  if (url) {
    return new Sequelize(url, { logging: false });
  }
  fs.mkdirSync(path.dirname(dbFile), { recursive: true });
  return new Sequelize({ dialect: "sqlite", dialectModule: sqliteWithPragmas, storage: dbFile, logging: false });
}

/**
 * sqlite3 with every connection set up as DESIGN.md asks: WAL journal (readers go on while one
 * writer writes) and a 5 s busy timeout. Sequelize's SQLite dialect opens one connection per
 * transaction and has no connect hook, so the pragmas go into the Database constructor itself.
 */
class GybeDatabase extends sqlite3.Database {
  constructor(filename: string, mode?: number, callback?: (err: Error | null) => void) {
    super(filename, mode ?? sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE, (err: Error | null) => {
      if (!err) {
        this.configure("busyTimeout", 5000);
        this.run("PRAGMA journal_mode=WAL");
      }
      callback?.(err);
    });
  }
}
const sqliteWithPragmas = { ...sqlite3, Database: GybeDatabase };

const g = globalThis as unknown as { __gybeSequelize?: Sequelize };
export const sequelize = (g.__gybeSequelize ??= createSequelize());
initModels(sequelize);
