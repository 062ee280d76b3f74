import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requireUser } from "@/lib/auth/dal";
import { getTourDetail } from "@/lib/db/queries/tours";
import { HttpError } from "@/lib/server/http";
import { PageHeader } from "@/components/ui/page-header";
import { StatusBadge } from "@/components/ui/badge";
import { CautionBanner } from "@/components/ui/caution-banner";
import { Card, CardHeader } from "@/components/ui/card";
import { Num } from "@/components/ui/num";
import { bodyLabel, dateOf, days } from "@/lib/format";

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

export default async function WorkbenchPage({ params }: Props) {
  const { tour } = await load((await params).id);
  const r = tour.result;
  return (
    <div className="space-y-4">
      <PageHeader
        eyebrow={<><StatusBadge status={tour.status} /> <span>owner {tour.ownerName} · version {tour.version}</span></>}
        title={tour.name}
        description={tour.chain.map(bodyLabel).join(" → ")}
      />
      <CautionBanner />
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_320px]">
        <Card>
          <CardHeader title="Chain" description="Launch, flybys and arrival, in order." />
          <table className="w-full text-sm">
            <thead className="bg-raised text-left text-xs uppercase tracking-wide text-muted">
              <tr><th className="px-4 py-2">#</th><th className="px-4 py-2">Body</th><th className="px-4 py-2">Epoch (UTC)</th><th className="px-4 py-2 text-right">Leg time of flight</th></tr>
            </thead>
            <tbody className="divide-y divide-line">
              {tour.tour.nodes.map((n, i) => (
                <tr key={n.id} data-testid="chain-node">
                  <td className="px-4 py-2 text-muted">{i + 1}</td>
                  <td className="px-4 py-2 text-ink">{bodyLabel(n.body)}</td>
                  <td className="num px-4 py-2">{dateOf(n.epoch)}</td>
                  <td className="px-4 py-2 text-right">{i === 0 ? <span className="text-faint">launch</span> : <Num value={days(n.epoch - tour.tour.nodes[i - 1]!.epoch)} unit="d" digits={1} />}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </Card>
        <Card>
          <CardHeader title="Δv budget" />
          <dl className="grid grid-cols-2 gap-y-2 px-4 pb-4 text-sm">
            <dt className="text-muted">Launch C3</dt><dd className="text-right"><Num value={r?.launch.c3} unit="km²/s²" /></dd>
            <dt className="text-muted">Launch v∞</dt><dd className="text-right"><Num value={r?.launch.vinf} unit="km/s" digits={3} /></dd>
            <dt className="text-muted">Flyby Δv</dt><dd className="text-right"><Num value={r ? r.flybys.reduce((s, f) => s + f.dv, 0) : null} unit="km/s" digits={3} /></dd>
            <dt className="text-muted">Arrival Δv</dt><dd className="text-right"><Num value={r?.arrival.dv} unit="km/s" digits={3} /></dd>
            <dt className="font-medium text-ink">Total Δv</dt><dd className="text-right font-medium"><Num value={r?.totalDv} unit="km/s" digits={3} /></dd>
          </dl>
        </Card>
      </div>
    </div>
  );
}
