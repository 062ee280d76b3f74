import type { Metadata } from "next";
import Link from "next/link";
import { can } from "@/lib/auth/roles";
import { loadPageTour } from "@/lib/tours/load-page-tour";
import { bodyLabel, dateOf } from "@/lib/format";
import { PageHeader } from "@/components/ui/page-header";
import { StatusBadge } from "@/components/ui/badge";
import { CautionBanner } from "@/components/ui/caution-banner";
import { TourSubnav } from "@/components/review/tour-subnav";
import { ReviewPanel } from "@/components/review/review-panel";
import { CommentsPanel } from "@/components/comments/comments-panel";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ id: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { tour } = await loadPageTour((await params).id);
  return { title: `Discussion — ${tour.name}` };
}

/** Discussion & review: the review status and its transitions, and the tour's comments. */
export default async function TourDiscussionPage({ params }: Props) {
  const { user, tour } = await loadPageTour((await params).id);
  const nodes = tour.tour.nodes.map((n, i) => ({ id: n.id, label: `${i + 1} · ${bodyLabel(n.body)} · ${dateOf(n.epoch)}` }));
  return (
    <div className="space-y-5">
      <PageHeader
        eyebrow={<><Link href="/tours" className="hover:text-ink">Tours</Link><span aria-hidden>/</span><StatusBadge status={tour.status} /></>}
        title={tour.name}
        description={`Owned by ${tour.ownerName}. Comments, review decisions and who was told.`}
      />
      <TourSubnav tourId={tour.id} current="discussion" />
      <CautionBanner />
      <div className="grid items-start gap-5 lg:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]">
        <ReviewPanel tourId={tour.id} status={tour.status} version={tour.version} role={user.role} isOwner={tour.ownerId === user.id} />
        <CommentsPanel tourId={tour.id} nodes={nodes} canComment={can(user.role, "comment")} />
      </div>
    </div>
  );
}
