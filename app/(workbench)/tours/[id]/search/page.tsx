import type { Metadata } from "next";
import { can } from "@/lib/auth/roles";
import { loadPageTour } from "@/lib/tours/load-page-tour";
import { SearchView } from "@/components/search/search-view";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ id: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { tour: detail } = await loadPageTour((await params).id);
  return { title: `Tour search · ${detail.name}` };
}

export default async function SearchPage({ params }: Props) {
  const { user, tour: detail } = await loadPageTour((await params).id);
  const canEdit = can(user.role, "tour:create") && detail.status !== "baselined";
  return <SearchView detail={detail} canEdit={canEdit} />;
}
