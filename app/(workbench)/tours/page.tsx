import type { Metadata } from "next";
import { requireUser } from "@/lib/auth/dal";
import { can } from "@/lib/auth/roles";
import { listTours } from "@/lib/db/queries/tours";
import { PageHeader } from "@/components/ui/page-header";
import { ToursTable } from "@/components/tours/tours-table";
import { NewTourButton } from "@/components/tours/new-tour-button";
import { CautionBanner } from "@/components/ui/caution-banner";

export const metadata: Metadata = { title: "Tours" };
export const dynamic = "force-dynamic";

export default async function ToursPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requireUser();
  const initial = await listTours(user, { sort: "updated", dir: "desc" });
  const sp = await searchParams;
  const canCreate = can(user.role, "tour:create");
  return (
    <div className="space-y-4">
      <PageHeader
        eyebrow={user.teamName}
        title="Tours"
        description="Every tour of the team with the server's own evaluation: launch date, C3, Δv, flight time, arrival v∞ and flyby margins."
        actions={canCreate ? <NewTourButton /> : null}
      />
      {sp.denied ? (
        <p role="alert" className="rounded-md border border-warn/40 bg-warn-soft px-4 py-2 text-sm text-warn">
          That screen is not open to your role.
        </p>
      ) : null}
      <CautionBanner />
      <ToursTable initial={initial} canCreate={canCreate} />
    </div>
  );
}
