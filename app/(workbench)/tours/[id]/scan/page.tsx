import type { Metadata } from "next";
import { can } from "@/lib/auth/roles";
import { loadPageTour } from "@/lib/tours/load-page-tour";
import { ScanView } from "@/components/scan/scan-view";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ id: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { tour: detail } = await loadPageTour((await params).id);
  return { title: `Window scan · ${detail.name}` };
}

export default async function ScanPage({ params }: Props) {
  const { user, tour: detail } = await loadPageTour((await params).id);
  const canEdit = can(user.role, "tour:create") && detail.status !== "baselined";
  return <ScanView detail={detail} canEdit={canEdit} />;
}
