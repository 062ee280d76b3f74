/** Migrations go up and down cleanly; the mailer stores messages locally and speaks SMTP when told to. */
import { afterAll, describe, expect, it } from "vitest";
import nodemailer from "nodemailer";
import { SMTPServer } from "smtp-server";
import { migrateDown, migrateUp } from "@/lib/db/migrator";
import { sequelize } from "@/lib/db/sequelize";
import { MailMessage, Team } from "@/models";
import { sendMail, setTransporterForTests } from "@/lib/mail/mailer";
import { migrations } from "@/migrations";

describe("migrations", () => {
  it("apply, revert every one, and apply again", async () => {
    expect(await migrateUp()).toEqual(migrations.map((m) => m.name));
    expect(await migrateUp()).toEqual([]);
    const reverted = await migrateDown({ to: 0 });
    expect(reverted).toEqual(migrations.map((m) => m.name).reverse());
    const tables = await sequelize.getQueryInterface().showAllTables();
    expect(tables.filter((t) => t !== "schema_migrations")).toEqual([]);
    expect(await migrateUp()).toHaveLength(migrations.length);
  });

  it("opens SQLite in WAL mode with a busy timeout", async () => {
    const [rows] = await sequelize.query("PRAGMA journal_mode;");
    expect((rows as { journal_mode: string }[])[0]?.journal_mode).toBe("wal");
    const [bt] = await sequelize.query("PRAGMA busy_timeout;");
    expect(Object.values((bt as Record<string, number>[])[0]!)[0]).toBe(5000);
  });
});

describe("mailer", () => {
  let server: SMTPServer | null = null;
  afterAll(async () => {
    setTransporterForTests(null);
    await new Promise<void>((r) => (server ? server.close(() => r()) : r()));
  });

  it("stores a message as a MailMessage row by default", async () => {
    const team = await Team.create({ name: "Mail test" });
    await sendMail({ teamId: team.id, to: ["a@x.example", "b@x.example"], subject: "Hello", text: "Body text" });
    const rows = await MailMessage.findAll({ where: { teamId: team.id } });
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ to: "a@x.example, b@x.example", subject: "Hello", text: "Body text" });
  });

  it("sends through an SMTP server when given one", async () => {
    const received: string[] = [];
    server = new SMTPServer({
      authOptional: true,
      disabledCommands: ["STARTTLS"],
      onData(stream, _session, cb) {
        let data = "";
        stream.on("data", (c: Buffer) => (data += c.toString()));
        stream.on("end", () => {
          received.push(data);
          cb();
        });
      },
    });
    await new Promise<void>((r) => server!.listen(0, "127.0.0.1", () => r()));
    const port = (server.server.address() as { port: number }).port;
    setTransporterForTests(nodemailer.createTransport({ host: "127.0.0.1", port, secure: false, ignoreTLS: true }));
    await sendMail({ teamId: null, to: "c@x.example", subject: "Via SMTP", text: "Over the wire" });
    expect(received).toHaveLength(1);
    expect(received[0]).toMatch(/Subject: Via SMTP/);
  });
});
