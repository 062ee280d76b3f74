import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { can } from "@/lib/auth/roles";
import { loadPageTour } from "@/lib/tours/load-page-tour";
import { bodyLabel } from "@/lib/format";
import { AimBoard } from "@/components/aim/aim-board";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ id: string; nodeId: string }> };

async function load(idRaw: string, nodeId: string) {
  const { user, tour } = await loadPageTour(idRaw);
  const index = tour.tour.nodes.findIndex((n) => n.id === nodeId);
  // Only intermediate nodes are flybys (the first is the launch, the last the arrival).
  if (index < 1 || index > tour.tour.nodes.length - 2) notFound();
  return { user, tour, index };
}

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const p = await params;
  const { tour, index } = await load(p.id, decodeURIComponent(p.nodeId));
  return { title: `Aim board · ${bodyLabel(tour.tour.nodes[index]!.body)} · ${tour.name}` };
}

export default async function AimBoardPage({ params }: Props) {
  const p = await params;
  const { user, tour, index } = await load(p.id, decodeURIComponent(p.nodeId));
  const canAim = can(user.role, "tour:aim");
  return (
    <AimBoard
      tourId={tour.id}
      name={tour.name}
      status={tour.status}
      version={tour.version}
      stored={tour.tour}
      customBodies={tour.customBodies}
      nodeIndex={index}
      canEdit={canAim && tour.status !== "baselined"}
      readOnlyReason={!canAim ? "role" : tour.status === "baselined" ? "baselined" : null}
    />
  );
}
