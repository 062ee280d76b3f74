/** Load a tour for a server-rendered tour sub-page: the signed-in user and the tour, or the 404 page. */
import "server-only";
import { cache } from "react";
import { notFound } from "next/navigation";
import { requireUser } from "@/lib/auth/dal";
import { getTourDetail } from "@/lib/db/queries/tours";
import { HttpError } from "@/lib/server/http";

/** Cached per request (React `cache`), so generateMetadata and the page share one load and one evaluation. */
export const loadPageTour = cache(async (idRaw: string) => {
  const user = await requireUser();
  if (!/^[1-9]\d{0,9}$/.test(idRaw)) notFound();
  try {
    return { user, tour: await getTourDetail(user, Number(idRaw)) };
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) notFound();
    throw err;
  }
});
