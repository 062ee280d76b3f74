import type { Metadata } from "next";
import { requirePageRole } from "@/lib/auth/dal";
import { listOutbox } from "@/lib/db/queries/team";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";
import { stamp } from "@/lib/format";

export const metadata: Metadata = { title: "Outbox" };
export const dynamic = "force-dynamic";

export default async function OutboxPage() {
  const user = await requirePageRole("team:manage");
  const { items, total } = await listOutbox(user);
  const viaSmtp = Boolean(process.env.SMTP_URL);
  return (
    <div className="space-y-6">
      <PageHeader
        eyebrow={user.teamName}
        title="Outbox"
        description={
          viaSmtp
            ? "Every message the mailer sent for the team (delivered through the configured SMTP server; a copy is kept here)."
            : "Every message the mailer sent for the team. Locally, mail is stored here instead of being delivered."
        }
        actions={<span className="text-xs text-muted">{total} message{total === 1 ? "" : "s"}</span>}
      />
      {items.length === 0 ? (
        <EmptyState title="No messages yet" description="Invitations, review decisions and mentions send e-mail; it will show up here." />
      ) : (
        <ul className="space-y-3">
          {items.map((m) => (
            <li key={m.id} data-testid="outbox-message" className="rounded-lg border border-line bg-surface">
              <details>
                <summary className="flex cursor-pointer flex-wrap items-baseline justify-between gap-2 px-4 py-3">
                  <span className="font-medium text-ink">{m.subject}</span>
                  <span className="text-xs text-muted">to {m.to} · {stamp(m.sentAt)}</span>
                </summary>
                <pre className="whitespace-pre-wrap border-t border-line px-4 py-3 font-sans text-sm text-muted">{m.text}</pre>
              </details>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
