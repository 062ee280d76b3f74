import type { Metadata } from "next";
import Link from "next/link";
import { GybeMark } from "@/components/brand/gybe-mark";
import { InviteForm } from "@/components/auth/invite-form";
import { LinkButton } from "@/components/ui/button";
import { lookupInvitation } from "@/lib/db/queries/team-admin";
import { ROLE_LABELS } from "@/lib/auth/roles";

export const metadata: Metadata = { title: "Join your team", robots: { index: false } };
export const dynamic = "force-dynamic";

type Props = { params: Promise<{ token: string }> };

const GONE = {
  unknown: { title: "This link does not work", text: "The invitation link is not valid — perhaps it was cut off, or a newer invitation replaced it. Ask your team lead to send a new one." },
  expired: { title: "This invitation has expired", text: "Invitation links work for 7 days. Ask your team lead to send you a new one." },
  accepted: { title: "This invitation was already used", text: "An account was created with this link. Sign in with your e-mail and password." },
} as const;

/** Accept an invitation: a set-password form, or a friendly page for unknown, expired and used links. */
export default async function InvitePage({ params }: Props) {
  const { token } = await params;
  const inv = await lookupInvitation(token);
  return (
    <div className="relative flex min-h-dvh flex-col">
      <div aria-hidden className="pointer-events-none absolute inset-0 bg-[radial-gradient(ellipse_at_50%_-10%,var(--gy-accent-soft),transparent_55%)]" />
      <main className="relative flex flex-1 items-center justify-center px-4 py-12">
        <div className="w-full max-w-sm">
          <div className="mb-8 flex flex-col items-center text-center">
            <Link href="/" aria-label="Gybe home" className="rounded-md">
              <GybeMark size={48} />
            </Link>
            {inv.state === "pending" ? (
              <>
                <h1 className="mt-4 text-2xl font-semibold tracking-tight text-ink">Join {inv.teamName}</h1>
                <p className="mt-1 text-sm text-muted">
                  You are invited as <strong className="text-ink">{ROLE_LABELS[inv.role!].toLowerCase()}</strong>. Choose your name and a password.
                </p>
              </>
            ) : (
              <h1 className="mt-4 text-2xl font-semibold tracking-tight text-ink">{GONE[inv.state].title}</h1>
            )}
          </div>
          <div className="rounded-panel border border-line bg-surface p-6 shadow-panel" data-testid="invite-card">
            {inv.state === "pending" ? (
              <InviteForm token={token} email={inv.email!} />
            ) : (
              <div className="flex flex-col gap-4 text-sm text-muted">
                <p>{GONE[inv.state].text}</p>
                <LinkButton href="/sign-in" variant={inv.state === "accepted" ? "primary" : "secondary"} className="w-full">
                  Go to sign-in
                </LinkButton>
              </div>
            )}
          </div>
        </div>
      </main>
    </div>
  );
}
