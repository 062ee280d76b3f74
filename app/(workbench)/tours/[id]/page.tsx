import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requireUser } from "@/lib/auth/dal";
import { can } from "@/lib/auth/roles";
import { getTourDetail } from "@/lib/db/queries/tours";
import { HttpError } from "@/lib/server/http";
import { Workbench } from "@/components/workbench/workbench";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ id: string }> };

async function load(idRaw: string) {
  const user = await requireUser();
  if (!/^[1-9]\d{0,9}$/.test(idRaw)) notFound();
  try {
    return { user, tour: await getTourDetail(user, Number(idRaw)) };
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) notFound();
    throw err;
  }
}

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { tour } = await load((await params).id);
  return { title: tour.name };
}

/** Workbench: the tour is loaded and the role decided on the server; the client edits and replays. */
export default async function WorkbenchPage({ params }: Props) {
  const { user, tour } = await load((await params).id);
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
