import type { Metadata } from "next";
import { requirePageRole } from "@/lib/auth/dal";
import { listAudit, listMembers } from "@/lib/db/queries/team";
import { listInvitations } from "@/lib/db/queries/team-admin";
import { TeamManager } from "@/components/team/team-manager";
import { PageHeader } from "@/components/ui/page-header";
import { Card, CardHeader } from "@/components/ui/card";

export const metadata: Metadata = { title: "Team" };
export const dynamic = "force-dynamic";

export default async function TeamPage() {
  const user = await requirePageRole("team:manage");
  const [members, invitations, auditTrail] = await Promise.all([listMembers(user), listInvitations(user), listAudit(user)]);
  return (
    <div className="space-y-6">
      <PageHeader eyebrow={user.teamName} title="Team" description="Members and their roles, invitations, and the audit trail of the team." />
      <TeamManager currentUserId={user.id} initialMembers={members} initialInvitations={invitations} initialAudit={auditTrail} />
      <Card>
        <CardHeader title="What each role may do" />
        <div className="overflow-x-auto">
          <table className="w-full text-sm">
            <thead className="bg-raised text-left text-xs uppercase tracking-wide text-muted">
              <tr><th className="px-4 py-2 font-medium">Action</th>{["Lead", "Designer", "Analyst", "Viewer"].map((r) => <th key={r} className="px-4 py-2 text-center font-medium">{r}</th>)}</tr>
            </thead>
            <tbody className="divide-y divide-line">
              {[
                ["Read, replay, compare and export tours", 1, 1, 1, 1],
                ["Create tours, edit chains and epochs, run searches, import", 1, 1, 0, 0],
                ["Edit aim points, dispersion and flyby options", 1, 1, 1, 0],
                ["Comment", 1, 1, 1, 0],
                ["Submit for review", 1, 1, 0, 0],
                ["Return, baseline, reopen; delete a tour", 1, 0, 0, 0],
                ["Catalog: add, edit, upload small bodies", 1, 1, 0, 0],
                ["Team, Outbox and audit trail", 1, 0, 0, 0],
              ].map(([label, ...cells]) => (
                <tr key={String(label)}>
                  <td className="px-4 py-2 text-ink">{label}</td>
                  {cells.map((c, i) => (
                    <td key={i} className="px-4 py-2 text-center">{c ? <span aria-label="allowed">✓</span> : <span className="text-faint" aria-label="not allowed">–</span>}</td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </Card>
    </div>
  );
}
