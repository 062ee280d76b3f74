import type { Metadata } from "next";
import { requireUser } from "@/lib/auth/dal";
import { can } from "@/lib/auth/roles";
import { listCatalog } from "@/lib/db/queries/catalog";
import { PageHeader } from "@/components/ui/page-header";
import { CautionBanner } from "@/components/ui/caution-banner";
import { PlanetsTable } from "@/components/catalog/planets-table";
import { BodiesPanel } from "@/components/catalog/bodies-panel";

export const metadata: Metadata = { title: "Catalog" };
export const dynamic = "force-dynamic";

/** Catalog: the planets (read-only) and the team's own small bodies. */
export default async function CatalogPage() {
  const user = await requireUser();
  const initial = await listCatalog(user);
  const canEdit = can(user.role, "catalog:edit");
  return (
    <div className="space-y-6">
      <PageHeader
        eyebrow={user.teamName}
        title="Catalog"
        description="The bodies a chain can use: the planets with the physical data every flyby is computed with, and the team's own small bodies."
      />
      <CautionBanner />
      <BodiesPanel initial={initial} canEdit={canEdit} />
      <PlanetsTable />
    </div>
  );
}
