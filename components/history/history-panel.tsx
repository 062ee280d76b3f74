"use client";

import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import useSWR, { useSWRConfig } from "swr";
import { ApiError, fetcher, sendJson } from "@/lib/client/fetcher";
import type { RevisionItem, RevisionCompare } from "@/lib/db/queries/revisions";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Num } from "@/components/ui/num";
import { Spinner } from "@/components/ui/spinner";
import { EmptyState } from "@/components/ui/empty-state";
import { days, stamp } from "@/lib/format";
import { InlineAlert } from "@/components/review/inline-alert";
import { DiffView } from "./diff-view";
import { useMounted } from "@/components/review/use-mounted";

export interface HistoryPanelProps {
  tourId: number;
  /** Lead or designer, and the tour is not baselined (the server checks again). */
  canRestore: boolean;
  /** Called after a restore with the new tour detail (the Workbench reloads its editor from it). */
  onRestored?: (tour: { version: number } & Record<string, unknown>) => void;
  className?: string;
}

interface RevisionList {
  items: RevisionItem[];
  total: number;
  currentVersion: number;
  status: string;
}

/**
 * History: every saved revision (author, time, note, key numbers), pick two to see what changed,
 * and restore an older one as a new revision. Self-contained: reads /api/tours/[id]/revisions.
 */
export function HistoryPanel({ tourId, canRestore, onRestored, className }: HistoryPanelProps) {
  const router = useRouter();
  const ready = useMounted();
  const { mutate } = useSWRConfig();
  const listKey = `/api/tours/${tourId}/revisions`;
  const { data, error, isLoading } = useSWR<RevisionList>(listKey, fetcher);
  const [a, setA] = useState<number | null>(null);
  const [b, setB] = useState<number | null>(null);
  const [confirm, setConfirm] = useState<number | null>(null);
  const [pending, setPending] = useState(false);
  const [message, setMessage] = useState<{ tone: "bad" | "ok"; text: string } | null>(null);

  // Default pair: the previous revision against the newest.
  useEffect(() => {
    if (!data || data.items.length === 0) return;
    const versions = data.items.map((r) => r.version);
    if (b === null || !versions.includes(b)) setB(versions[0]!);
    if (a === null || !versions.includes(a)) setA(versions[1] ?? versions[0]!);
  }, [data, a, b]);

  const compareKey = a !== null && b !== null && a !== b ? `${listKey}?compare=${Math.min(a, b)},${Math.max(a, b)}` : null;
  const cmp = useSWR<RevisionCompare>(compareKey, fetcher);

  async function restore(restoreVersion: number) {
    if (!data) return;
    setPending(true);
    setMessage(null);
    try {
      const tour = await sendJson<{ version: number } & Record<string, unknown>>(listKey, "POST", { restoreVersion, version: data.currentVersion });
      setMessage({ tone: "ok", text: `Version ${restoreVersion} restored as version ${tour.version}.` });
      setConfirm(null);
      setA(restoreVersion);
      setB(tour.version);
      onRestored?.(tour);
      await mutate((key) => typeof key === "string" && key.startsWith(`/api/tours/${tourId}`));
      router.refresh();
    } catch (err) {
      setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "Could not reach the server. Try again." });
      if (err instanceof ApiError && err.status === 409) void mutate(listKey);
    } finally {
      setPending(false);
    }
  }

  return (
    <Card className={className} data-testid="history-panel" data-ready={ready || undefined}>
      <CardHeader
        title="History"
        description={data ? `${data.total} revision${data.total === 1 ? "" : "s"} · current version ${data.currentVersion}` : "Every saved state of the tour"}
      />
      <CardBody className="space-y-5">
        {message ? <InlineAlert tone={message.tone}>{message.text}</InlineAlert> : null}
        {error ? (
          <InlineAlert>{error instanceof ApiError ? error.message : "Could not load the history."}</InlineAlert>
        ) : isLoading || !data ? (
          <div className="flex items-center gap-2 text-sm text-muted"><Spinner size={14} /> Loading revisions…</div>
        ) : data.items.length === 0 ? (
          <EmptyState title="No revisions yet" description="Each save, review step and restore adds one." />
        ) : (
          <div className="overflow-x-auto">
            <table className="w-full text-sm">
              <caption className="sr-only">Revisions; pick A and B to compare them</caption>
              <thead className="bg-raised text-left text-xs uppercase tracking-wide text-muted">
                <tr>
                  <th className="px-2 py-2 text-center font-medium" title="Compare from">A</th>
                  <th className="px-2 py-2 text-center font-medium" title="Compare to">B</th>
                  <th className="px-3 py-2 font-medium">Version</th>
                  <th className="px-3 py-2 font-medium">Note</th>
                  <th className="px-3 py-2 font-medium">Author</th>
                  <th className="px-3 py-2 font-medium">When</th>
                  <th className="px-3 py-2 text-right font-medium">C3</th>
                  <th className="px-3 py-2 text-right font-medium">Total Δv</th>
                  <th className="px-3 py-2 text-right font-medium">Flight time</th>
                  <th className="px-3 py-2 text-right font-medium">Violations</th>
                  {canRestore ? <th className="px-3 py-2 text-right font-medium"><span className="sr-only">Restore</span></th> : null}
                </tr>
              </thead>
              <tbody className="divide-y divide-line">
                {data.items.map((r) => {
                  const current = r.version === data.currentVersion;
                  return (
                    <tr key={r.id} data-testid="revision-row" className={current ? "bg-accent-soft/30" : undefined}>
                      <td className="px-2 py-2 text-center">
                        <input type="radio" name="rev-a" aria-label={`Compare from version ${r.version}`} checked={a === r.version} onChange={() => setA(r.version)} className="accent-[var(--gy-accent)]" />
                      </td>
                      <td className="px-2 py-2 text-center">
                        <input type="radio" name="rev-b" aria-label={`Compare to version ${r.version}`} checked={b === r.version} onChange={() => setB(r.version)} className="accent-[var(--gy-accent)]" />
                      </td>
                      <td className="px-3 py-2 num text-ink">
                        v{r.version}
                        {current ? <span className="ml-2 font-sans text-xs text-accent">current</span> : null}
                      </td>
                      <td className="max-w-xs px-3 py-2 text-muted"><span className="line-clamp-2">{r.note ?? "—"}</span></td>
                      <td className="px-3 py-2 text-ink">{r.authorName ?? "—"}</td>
                      <td className="px-3 py-2 text-xs whitespace-nowrap text-muted">{stamp(r.createdAt)}</td>
                      <td className="px-3 py-2 text-right"><Num value={r.summary.c3Km2S2} unit="km²/s²" /></td>
                      <td className="px-3 py-2 text-right"><Num value={r.summary.totalDvKmS} unit="km/s" digits={3} /></td>
                      <td className="px-3 py-2 text-right"><Num value={days(r.summary.tofS)} unit="d" digits={0} /></td>
                      <td className="px-3 py-2 text-right"><Num value={r.summary.violationCount} digits={0} /></td>
                      {canRestore ? (
                        <td className="px-3 py-2 text-right whitespace-nowrap">
                          {current ? null : confirm === r.version ? (
                            <span className="inline-flex items-center gap-1.5">
                              <Button size="sm" variant="primary" pending={pending} onClick={() => restore(r.version)}>Confirm restore</Button>
                              <Button size="sm" variant="ghost" disabled={pending} onClick={() => setConfirm(null)}>Cancel</Button>
                            </span>
                          ) : (
                            <Button size="sm" onClick={() => { setConfirm(r.version); setMessage(null); }} aria-label={`Restore version ${r.version}`}>Restore</Button>
                          )}
                        </td>
                      ) : null}
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        )}

        {data && data.items.length > 1 ? (
          <section aria-label="Differences" className="border-t border-line pt-4">
            {a === b ? (
              <p className="text-sm text-muted">Pick two different revisions (A and B) to see what changed.</p>
            ) : cmp.error ? (
              <InlineAlert>{cmp.error instanceof ApiError ? cmp.error.message : "Could not compare these revisions."}</InlineAlert>
            ) : !cmp.data ? (
              <div className="flex items-center gap-2 text-sm text-muted"><Spinner size={14} /> Comparing…</div>
            ) : (
              <DiffView diff={cmp.data.diff} fromVersion={cmp.data.from.version} toVersion={cmp.data.to.version} />
            )}
          </section>
        ) : null}
      </CardBody>
    </Card>
  );
}
