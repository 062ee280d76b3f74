/**
 * The mailer: nodemailer with, locally, a transport that stores each message as a MailMessage
 * row (shown in Outbox). When SMTP_URL is set, messages go through that server instead, and a
 * copy is still kept as a MailMessage row so the lead's Outbox shows what was sent.
 */
import nodemailer, { type SendMailOptions, type Transporter } from "nodemailer";
import type SMTPTransport from "nodemailer/lib/smtp-transport";
import "@/lib/db/sequelize"; // initialises the models in this bundle (see lib/db/sequelize.ts)
import { MailMessage } from "@/models";

export interface OutgoingMail {
  teamId: number | null;
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
}

const FROM = process.env.MAIL_FROM ?? "Gybe <no-reply@gybe.invalid>";

interface StoredInfo {
  messageId: string;
  envelope: { from: string; to: string[] };
}

/** A nodemailer transport that writes the message to the mail_messages table instead of sending. */
function outboxTransport() {
  return {
    name: "gybe-outbox",
    version: "1.0.0",
    send(mail: { data: Record<string, unknown>; message: { getEnvelope(): { from: string; to: string[] }; messageId(): string } }, done: (err: Error | null, info?: StoredInfo) => void) {
      const d = mail.data as { to?: string | string[]; subject?: string; text?: string; html?: string; gybeTeamId?: number | null };
      const to = Array.isArray(d.to) ? d.to.join(", ") : String(d.to ?? "");
      MailMessage.create({
        teamId: d.gybeTeamId ?? null,
        to,
        subject: String(d.subject ?? ""),
        text: String(d.text ?? ""),
        html: d.html ? String(d.html) : null,
      }).then(
        () => done(null, { messageId: mail.message.messageId(), envelope: mail.message.getEnvelope() }),
        (err: Error) => done(err),
      );
    },
  };
}

let transporter: Transporter | null = null;
function getTransporter(): Transporter {
  if (!transporter) {
    transporter = process.env.SMTP_URL
      ? nodemailer.createTransport(process.env.SMTP_URL as unknown as SMTPTransport.Options)
      : nodemailer.createTransport(outboxTransport() as unknown as SMTPTransport.Options);
  }
  return transporter;
}

/** For tests: use this transport instead of the default (null restores the default). */
export function setTransporterForTests(t: Transporter | null): void {
  transporter = t;
}

export async function sendMail(mail: OutgoingMail): Promise<void> {
  const t = getTransporter();
  await t.sendMail({ from: FROM, to: mail.to, subject: mail.subject, text: mail.text, html: mail.html, gybeTeamId: mail.teamId } as SendMailOptions);
  if (process.env.SMTP_URL) {
    await MailMessage.create({
      teamId: mail.teamId,
      to: Array.isArray(mail.to) ? mail.to.join(", ") : mail.to,
      subject: mail.subject,
      text: mail.text,
      html: mail.html ?? null,
    });
  }
}
