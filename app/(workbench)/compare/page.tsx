import type { Metadata } from "next";
import { requireUser } from "@/lib/auth/dal";
import { getTourDetail } from "@/lib/db/queries/tours";
import { HttpError } from "@/lib/server/http";
import { COMPARE_MAX, COMPARE_MIN, compareItemOf, parseCompareIds, type CompareItem } from "@/lib/tours/compare";
import { PageHeader } from "@/components/ui/page-header";
import { CautionBanner } from "@/components/ui/caution-banner";
import { EmptyState } from "@/components/ui/empty-state";
import { LinkButton } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { MetricsTable } from "@/components/compare/metrics-table";
import { DvBars } from "@/components/compare/dv-bars";
import { Timelines } from "@/components/compare/timelines";
import { CompareOrrery, type CompareOrreryProps } from "@/components/compare/compare-orrery";

export const metadata: Metadata = { title: "Compare" };
export const dynamic = "force-dynamic";

/** Compare: 2–6 tours of the team side by side (shareable: the URL carries the ids). */
export default async function ComparePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireUser();
  const sp = await searchParams;
  const raw = Array.isArray(sp.ids) ? sp.ids.join(",") : sp.ids;
  const ids = parseCompareIds(raw);

  const header = (
    <PageHeader
      eyebrow={user.teamName}
      title="Compare"
      description="Selected tours side by side: launch energy, Δv budget, flight time, arrival v∞ and flyby margins from the server's own evaluation. Share this page's address to share the comparison."
      actions={<LinkButton href="/tours" size="sm" variant="secondary">Choose tours</LinkButton>}
    />
  );

  const pick = (title: string, description: string) => (
    <div className="space-y-4">
      {header}
      <CautionBanner />
      <EmptyState
        title={title}
        description={description}
        actions={<LinkButton href="/tours" variant="primary">Pick tours on Tours</LinkButton>}
      />
    </div>
  );

  if (!raw) return pick("Nothing to compare yet", `Tick ${COMPARE_MIN}–${COMPARE_MAX} tours in the Tours table and press Compare.`);
  if (!ids) return pick("This comparison link is not valid", "The address should end in ?ids= followed by tour numbers separated by commas.");
  if (ids.length < COMPARE_MIN || ids.length > COMPARE_MAX) {
    return pick(`Compare takes ${COMPARE_MIN}–${COMPARE_MAX} tours`, `This link names ${ids.length} different tour${ids.length === 1 ? "" : "s"}. Tick ${COMPARE_MIN}–${COMPARE_MAX} tours in the Tours table.`);
  }

  const items: CompareItem[] = [];
  const scene: CompareOrreryProps["tours"] = [];
  const missing: number[] = [];
  for (const id of ids) {
    try {
      const d = await getTourDetail(user, id);
      items.push(compareItemOf(d));
      scene.push({ id: d.id, name: d.name, tour: d.tour, customBodies: d.customBodies });
    } catch (err) {
      if (err instanceof HttpError && err.status === 404) missing.push(id);
      else throw err;
    }
  }
  if (missing.length) {
    return pick(
      missing.length === 1 ? "One of these tours is not available" : "Some of these tours are not available",
      `Tour${missing.length === 1 ? "" : "s"} ${missing.join(", ")} ${missing.length === 1 ? "does" : "do"} not exist or belong${missing.length === 1 ? "s" : ""} to another team. Pick tours again on Tours.`,
    );
  }

  return (
    <div className="space-y-6">
      {header}
      <CautionBanner />
      <MetricsTable items={items} />
      <div className="grid gap-6 2xl:grid-cols-2">
        <Card aria-labelledby="dv-title">
          <CardHeader title={<span id="dv-title">Δv budget</span>} description="What the spacecraft pays (flybys + arrival) and, beneath, the launch v∞ the launcher provides — one scale for all tours." />
          <CardBody><DvBars items={items} /></CardBody>
        </Card>
        <Card aria-labelledby="tl-title-h">
          <CardHeader title={<span id="tl-title-h">Timelines</span>} description="Launch, flybys and arrival of each tour on one date axis." />
          <CardBody><Timelines items={items} /></CardBody>
        </Card>
      </div>
      <Card aria-labelledby="orrery-title">
        <CardHeader title={<span id="orrery-title">Orrery</span>} description="All selected tours in one scene, replayed on one clock." />
        <CardBody><CompareOrrery tours={scene} /></CardBody>
      </Card>
    </div>
  );
}
