import type { Metadata } from "next";
import Link from "next/link";
import { can } from "@/lib/auth/roles";
import { loadPageTour } from "@/lib/tours/load-page-tour";
import { PageHeader } from "@/components/ui/page-header";
import { StatusBadge } from "@/components/ui/badge";
import { CautionBanner } from "@/components/ui/caution-banner";
import { TourSubnav } from "@/components/review/tour-subnav";
import { HistoryPanel } from "@/components/history/history-panel";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ id: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { tour } = await loadPageTour((await params).id);
  return { title: `History — ${tour.name}` };
}

/** History: the tour's revisions, the diff between two of them, restore (lead, designer). */
export default async function TourHistoryPage({ params }: Props) {
  const { user, tour } = await loadPageTour((await params).id);
  const canRestore = can(user.role, "tour:create") && tour.status !== "baselined";
  return (
    <div className="space-y-5">
      <PageHeader
        eyebrow={<><Link href="/tours" className="hover:text-ink">Tours</Link><span aria-hidden>/</span><StatusBadge status={tour.status} /></>}
        title={tour.name}
        description={
          tour.status === "baselined"
            ? "Every saved state of this tour. It is baselined: a lead must reopen it before an older version can be restored."
            : canRestore
              ? "Every saved state of this tour. Pick two revisions to see what changed; restoring one saves it as a new revision."
              : "Every saved state of this tour. Pick two revisions to see what changed."
        }
      />
      <TourSubnav tourId={tour.id} current="history" />
      <CautionBanner />
      <HistoryPanel tourId={tour.id} canRestore={canRestore} />
    </div>
  );
}
