import type { Metadata } from "next";
import { can } from "@/lib/auth/roles";
import { loadPageTour } from "@/lib/tours/load-page-tour";
import { Workbench } from "@/components/workbench/workbench";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ id: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { tour } = await loadPageTour((await params).id);
  return { title: tour.name };
}

/** Workbench: the tour is loaded and the role decided on the server; the client edits and replays. */
export default async function WorkbenchPage({ params }: Props) {
  const { user, tour } = await loadPageTour((await params).id);
  const open = tour.status !== "baselined";
  return (
    <Workbench
      detail={tour}
      canEditChain={can(user.role, "tour:create") && open}
      canEditAim={can(user.role, "tour:aim") && open}
      canSearch={can(user.role, "tour:create") && open}
      role={user.role}
      isOwner={tour.ownerId === user.id}
    />
  );
}
