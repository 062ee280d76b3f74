import type { Metadata } from "next";
import { requirePageRole } from "@/lib/auth/dal";
import { listMembers } from "@/lib/db/queries/team";
import { PageHeader } from "@/components/ui/page-header";
import { RoleBadge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import { stamp } from "@/lib/format";

export const metadata: Metadata = { title: "Team" };
export const dynamic = "force-dynamic";

export default async function TeamPage() {
  const user = await requirePageRole("team:manage");
  const { items } = await listMembers(user);
  return (
    <div className="space-y-6">
      <PageHeader eyebrow={user.teamName} title="Team" description="Members of the team and what each role may do." />
      <Card>
        <CardHeader title="Members" description={`${items.filter((m) => m.active).length} active of ${items.length}`} />
        <div className="overflow-x-auto">
          <table className="w-full text-sm">
            <thead className="bg-raised text-left text-xs uppercase tracking-wide text-muted">
              <tr>
                <th className="px-4 py-2 font-medium">Name</th>
                <th className="px-4 py-2 font-medium">E-mail</th>
                <th className="px-4 py-2 font-medium">Role</th>
                <th className="px-4 py-2 font-medium">State</th>
                <th className="px-4 py-2 text-right font-medium">Member since</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-line">
              {items.map((m) => (
                <tr key={m.id} data-testid="member-row">
                  <td className="px-4 py-2.5 font-medium text-ink">{m.name}{m.id === user.id ? <span className="ml-2 text-xs text-muted">(you)</span> : null}</td>
                  <td className="px-4 py-2.5 text-muted">{m.email}</td>
                  <td className="px-4 py-2.5"><RoleBadge role={m.role} /></td>
                  <td className="px-4 py-2.5 text-muted">{m.active ? "Active" : "Deactivated"}</td>
                  <td className="px-4 py-2.5 text-right text-xs text-muted">{stamp(m.createdAt)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </Card>
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
