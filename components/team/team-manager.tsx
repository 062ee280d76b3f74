"use client";

import { useState, type FormEvent } from "react";
import useSWR from "swr";
import { ApiError, fetcher, sendJson } from "@/lib/client/fetcher";
import type { MemberItem, AuditItem } from "@/lib/db/queries/team";
import type { InvitationItem } from "@/lib/db/queries/team-admin";
import { ROLES, ROLE_LABELS, type Role } from "@/lib/auth/roles";
import { Button } from "@/components/ui/button";
import { Field, SelectField } from "@/components/ui/field";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Badge, RoleBadge } from "@/components/ui/badge";
import { stamp } from "@/lib/format";
import { InlineAlert } from "@/components/review/inline-alert";
import { useMounted } from "@/components/review/use-mounted";

type List<T> = { items: T[]; total: number };

export interface TeamManagerProps {
  currentUserId: number;
  initialMembers: List<MemberItem>;
  initialInvitations: List<InvitationItem>;
  initialAudit: List<AuditItem>;
}

const ACTION_LABELS: Record<string, string> = {
  sign_in: "signed in",
  "tour.create": "created a tour",
  "tour.update": "saved a tour",
  "tour.overwrite": "overwrote a newer version of a tour",
  "tour.delete": "deleted a tour",
  "tour.review.submit": "submitted a tour for review",
  "tour.review.baseline": "baselined a tour",
  "tour.review.return": "returned a tour",
  "tour.review.reopen": "reopened a tour",
  "comment.create": "commented",
  "comment.delete": "deleted a comment",
  "member.role": "changed a member's role",
  "member.deactivate": "deactivated a member",
  "member.reactivate": "reactivated a member",
  "invitation.create": "invited someone",
  "invitation.revoke": "revoked an invitation",
  "invitation.accept": "joined the team by invitation",
};

/** A short readable line from the audit detail JSON. */
function detailText(action: string, detail: string | null): string {
  if (!detail) return "";
  try {
    const d = JSON.parse(detail) as Record<string, unknown>;
    if (action.startsWith("tour.review.")) return `${String(d.from ?? "").replace("_", " ")} → ${String(d.to ?? "").replace("_", " ")}${d.comment ? ` · “${String(d.comment).slice(0, 80)}”` : ""}`;
    if (action === "member.role" || action.startsWith("member.")) {
      const from = d.from as { role?: string; active?: boolean } | undefined;
      const to = d.to as { role?: string; active?: boolean } | undefined;
      return `${String(d.email ?? "")}${from && to && from.role !== to.role ? ` · ${from.role} → ${to.role}` : ""}`;
    }
    if (action.startsWith("invitation.")) return `${String(d.email ?? "")}${d.role ? ` as ${String(d.role)}` : ""}`;
    if (typeof d.name === "string") return d.name;
    if (typeof d.version === "number") return `version ${d.version}`;
    if (typeof d.nodeId === "string") return `pinned to ${d.nodeId}`;
    return "";
  } catch {
    return "";
  }
}

function Members({ currentUserId, initial, onChanged }: { currentUserId: number; initial: List<MemberItem>; onChanged: () => void }) {
  const { data, mutate } = useSWR<List<MemberItem>>("/api/team/members", fetcher, { fallbackData: initial });
  const [busy, setBusy] = useState<number | null>(null);
  const [message, setMessage] = useState<{ tone: "bad" | "ok"; text: string } | null>(null);
  const items = data?.items ?? [];

  async function patch(m: MemberItem, body: { role?: Role; active?: boolean }, done: string) {
    setBusy(m.id);
    setMessage(null);
    try {
      await sendJson(`/api/team/members/${m.id}`, "PATCH", body);
      setMessage({ tone: "ok", text: done });
      await mutate();
      onChanged();
    } catch (err) {
      setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "Could not reach the server. Try again." });
      await mutate(); // put the select back to the stored role
    } finally {
      setBusy(null);
    }
  }

  return (
    <Card>
      <CardHeader title="Members" description={`${items.filter((m) => m.active).length} active of ${items.length}`} />
      {message ? <div className="px-5 pt-4"><InlineAlert tone={message.tone}>{message.text}</InlineAlert></div> : null}
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead className="bg-raised text-left text-xs uppercase tracking-wide text-muted">
            <tr>
              <th className="px-4 py-2 font-medium">Name</th>
              <th className="px-4 py-2 font-medium">E-mail</th>
              <th className="px-4 py-2 font-medium">Role</th>
              <th className="px-4 py-2 font-medium">State</th>
              <th className="px-4 py-2 text-right font-medium">Member since</th>
              <th className="px-4 py-2 text-right font-medium"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody className="divide-y divide-line">
            {items.map((m) => (
              <tr key={m.id} data-testid="member-row" className={m.active ? undefined : "opacity-70"}>
                <td className="px-4 py-2.5 font-medium text-ink">
                  {m.name}
                  {m.id === currentUserId ? <span className="ml-2 text-xs text-muted">(you)</span> : null}
                </td>
                <td className="px-4 py-2.5 text-muted">{m.email}</td>
                <td className="px-4 py-2.5">
                  <select
                    aria-label={`Role of ${m.name}`}
                    value={m.role}
                    disabled={busy !== null}
                    onChange={(e) => patch(m, { role: e.target.value as Role }, `${m.name} is now ${ROLE_LABELS[e.target.value as Role].toLowerCase()}.`)}
                    className="h-8 rounded-md border border-line-strong bg-field px-2 text-sm text-ink"
                  >
                    {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
                  </select>
                </td>
                <td className="px-4 py-2.5">
                  {m.active ? <Badge tone="ok">Active</Badge> : <Badge tone="neutral">Deactivated</Badge>}
                </td>
                <td className="px-4 py-2.5 text-right text-xs text-muted">{stamp(m.createdAt)}</td>
                <td className="px-4 py-2.5 text-right">
                  <Button
                    size="sm"
                    variant={m.active ? "danger" : "secondary"}
                    pending={busy === m.id}
                    disabled={busy !== null && busy !== m.id}
                    onClick={() => patch(m, { active: !m.active }, m.active ? `${m.name} is deactivated and can no longer sign in.` : `${m.name} can sign in again.`)}
                    aria-label={`${m.active ? "Deactivate" : "Reactivate"} ${m.name}`}
                  >
                    {m.active ? "Deactivate" : "Reactivate"}
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </Card>
  );
}

function Invitations({ initial, onChanged }: { initial: List<InvitationItem>; onChanged: () => void }) {
  const { data, mutate } = useSWR<List<InvitationItem>>("/api/team/invitations", fetcher, { fallbackData: initial });
  const [email, setEmail] = useState("");
  const [role, setRole] = useState<Role>("designer");
  const [pending, setPending] = useState(false);
  const [fieldError, setFieldError] = useState<{ email?: string; role?: string }>({});
  const [message, setMessage] = useState<{ tone: "bad" | "ok"; text: string } | null>(null);
  const [revoking, setRevoking] = useState<number | null>(null);

  async function invite(e: FormEvent) {
    e.preventDefault();
    setPending(true);
    setFieldError({});
    setMessage(null);
    try {
      const r = await sendJson<{ invitation: InvitationItem }>("/api/team/invitations", "POST", { email, role });
      setMessage({ tone: "ok", text: `Invitation sent to ${r.invitation.email}. The message is in the Outbox; the link works once, for 7 days.` });
      setEmail("");
      await mutate();
      onChanged();
    } catch (err) {
      if (err instanceof ApiError && err.issues.length) {
        const next: { email?: string; role?: string } = {};
        for (const i of err.issues) if (i.path === "email" || i.path === "role") next[i.path] ??= i.message;
        setFieldError(next);
        if (err.status === 409) setFieldError({ email: err.message });
      } else setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "Could not reach the server. Try again." });
    } finally {
      setPending(false);
    }
  }

  async function revoke(i: InvitationItem) {
    setRevoking(i.id);
    setMessage(null);
    try {
      await sendJson(`/api/team/invitations/${i.id}`, "DELETE");
      setMessage({ tone: "ok", text: `The invitation to ${i.email} no longer works.` });
      await mutate();
      onChanged();
    } catch (err) {
      setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "Could not revoke the invitation." });
    } finally {
      setRevoking(null);
    }
  }

  const items = data?.items ?? [];
  return (
    <Card>
      <CardHeader title="Invitations" description="Invite someone by e-mail: they get a one-time link to set their name and password." />
      <CardBody className="space-y-4">
        <form onSubmit={invite} noValidate className="flex flex-wrap items-start gap-3">
          <Field label="E-mail" name="invite-email" type="email" autoComplete="off" value={email} onChange={(e) => setEmail(e.target.value)} error={fieldError.email} placeholder="name@team.example" className="min-w-64 flex-1" />
          <SelectField label="Role" name="invite-role" value={role} onChange={(e) => setRole(e.target.value as Role)} error={fieldError.role} className="w-48">
            {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
          </SelectField>
          <Button type="submit" variant="primary" pending={pending} className="mt-6">Send invitation</Button>
        </form>
        {message ? <InlineAlert tone={message.tone}>{message.text}</InlineAlert> : null}
        {items.length === 0 ? (
          <p className="text-sm text-faint">No invitations in the last 30 days.</p>
        ) : (
          <ul className="divide-y divide-line rounded-md border border-line">
            {items.map((i) => (
              <li key={i.id} data-testid="invitation-row" className="flex flex-wrap items-center justify-between gap-3 px-3 py-2 text-sm">
                <span className="flex min-w-0 items-center gap-2">
                  <span className="font-medium text-ink">{i.email}</span>
                  <RoleBadge role={i.role} />
                  <Badge tone={i.state === "pending" ? "info" : i.state === "accepted" ? "ok" : "neutral"}>{i.state === "pending" ? "Pending" : i.state === "accepted" ? "Joined" : "Expired"}</Badge>
                </span>
                <span className="flex items-center gap-3 text-xs text-muted">
                  <span>
                    {i.state === "accepted" && i.acceptedAt ? `joined ${stamp(i.acceptedAt)}` : i.state === "pending" ? `expires ${stamp(i.expiresAt)}` : `sent ${stamp(i.createdAt)}`}
                    {i.invitedByName ? ` · by ${i.invitedByName}` : ""}
                  </span>
                  {i.state === "pending" ? (
                    <Button size="sm" variant="ghost" pending={revoking === i.id} onClick={() => revoke(i)} aria-label={`Revoke the invitation to ${i.email}`}>Revoke</Button>
                  ) : null}
                </span>
              </li>
            ))}
          </ul>
        )}
      </CardBody>
    </Card>
  );
}

function AuditTrail({ initial }: { initial: List<AuditItem> }) {
  const { data } = useSWR<List<AuditItem>>("/api/audit", fetcher, { fallbackData: initial });
  const items = data?.items ?? [];
  return (
    <Card>
      <CardHeader title="Audit trail" description={`Who did what, newest first (${items.length} of ${data?.total ?? 0} shown).`} />
      <div className="max-h-[32rem] overflow-auto">
        <table className="w-full text-sm">
          <thead className="sticky top-0 bg-raised text-left text-xs uppercase tracking-wide text-muted">
            <tr>
              <th className="px-4 py-2 font-medium">When</th>
              <th className="px-4 py-2 font-medium">Who</th>
              <th className="px-4 py-2 font-medium">What</th>
              <th className="px-4 py-2 font-medium">Record</th>
              <th className="px-4 py-2 font-medium">Details</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-line">
            {items.map((a) => (
              <tr key={a.id} data-testid="audit-row">
                <td className="px-4 py-2 text-xs whitespace-nowrap text-muted">{stamp(a.at)}</td>
                <td className="px-4 py-2 text-ink">{a.actorName ?? "—"}</td>
                <td className="px-4 py-2 text-ink">{ACTION_LABELS[a.action] ?? a.action}</td>
                <td className="px-4 py-2 num text-xs text-muted">{a.target}</td>
                <td className="max-w-sm px-4 py-2 text-xs text-muted"><span className="line-clamp-2">{detailText(a.action, a.detail)}</span></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </Card>
  );
}

/** The lead's Team screen: members (role, deactivate), invitations, audit trail. */
export function TeamManager({ currentUserId, initialMembers, initialInvitations, initialAudit }: TeamManagerProps) {
  const { mutate } = useSWR<List<AuditItem>>("/api/audit", fetcher, { fallbackData: initialAudit });
  const refreshAudit = () => void mutate();
  const ready = useMounted();
  return (
    <div className="space-y-6" data-testid="team-manager" data-ready={ready || undefined}>
      <Members currentUserId={currentUserId} initial={initialMembers} onChanged={refreshAudit} />
      <Invitations initial={initialInvitations} onChanged={refreshAudit} />
      <AuditTrail initial={initialAudit} />
    </div>
  );
}
