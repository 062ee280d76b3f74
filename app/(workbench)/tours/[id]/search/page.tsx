import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requireUser } from "@/lib/auth/dal";
import { can } from "@/lib/auth/roles";
import { getTourDetail } from "@/lib/db/queries/tours";
import { HttpError } from "@/lib/server/http";
import { SearchView } from "@/components/search/search-view";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ id: string }> };

async function load(idRaw: string) {
  const user = await requireUser();
  if (!/^[1-9]\d{0,9}$/.test(idRaw)) notFound();
  try {
    return { user, detail: await getTourDetail(user, Number(idRaw)) };
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) notFound();
    throw err;
  }
}

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { detail } = await load((await params).id);
  return { title: `Tour search · ${detail.name}` };
}

export default async function SearchPage({ params }: Props) {
  const { user, detail } = await load((await params).id);
  const canEdit = can(user.role, "tour:create") && detail.status !== "baselined";
  return <SearchView detail={detail} canEdit={canEdit} />;
}
