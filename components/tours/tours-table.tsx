"use client";

import Link from "next/link";
import { useMemo, useState } from "react";
import useSWR from "swr";
import { fetcher } from "@/lib/client/fetcher";
import type { TourListItem } from "@/lib/db/queries/tours";
import { StatusBadge } from "@/components/ui/badge";
import { Num } from "@/components/ui/num";
import { EmptyState } from "@/components/ui/empty-state";
import { LinkButton } from "@/components/ui/button";
import { Spinner } from "@/components/ui/spinner";
import { bodyLabel, dateOf, days, stamp } from "@/lib/format";

type SortKey = "name" | "owner" | "status" | "updated" | "launch" | "c3" | "dv" | "tof" | "arrivalVinf" | "margin";

export interface ToursTableProps {
  initial: { items: TourListItem[]; total: number };
  canCreate: boolean;
}

const COLUMNS: { key: SortKey; label: string; className?: string }[] = [
  { key: "name", label: "Name" },
  { key: "owner", label: "Owner" },
  { key: "status", label: "Status" },
  { key: "launch", label: "Launch", className: "text-right" },
  { key: "c3", label: "C3", className: "text-right" },
  { key: "dv", label: "Total Δv", className: "text-right" },
  { key: "tof", label: "Flight time", className: "text-right" },
  { key: "arrivalVinf", label: "Arrival v∞", className: "text-right" },
  { key: "margin", label: "Min flyby margin", className: "text-right" },
  { key: "updated", label: "Updated", className: "text-right" },
];

export function ToursTable({ initial, canCreate }: ToursTableProps) {
  const [status, setStatus] = useState("");
  const [q, setQ] = useState("");
  const [body, setBody] = useState("");
  const [dvMin, setDvMin] = useState("");
  const [dvMax, setDvMax] = useState("");
  const [c3Min, setC3Min] = useState("");
  const [c3Max, setC3Max] = useState("");
  const [owner, setOwner] = useState("");
  const { data: members } = useSWR<{ items: { id: number; name: string }[] }>("/api/team/members", fetcher);
  const [sort, setSort] = useState<SortKey>("updated");
  const [dir, setDir] = useState<"asc" | "desc">("desc");
  const [selected, setSelected] = useState<number[]>([]);

  const url = useMemo(() => {
    const p = new URLSearchParams();
    if (status) p.set("status", status);
    if (q.trim()) p.set("q", q.trim());
    if (body) p.set("body", body);
    const num = /^\d+(\.\d+)?$/;
    if (num.test(dvMin)) p.set("dvMin", dvMin);
    if (num.test(dvMax)) p.set("dvMax", dvMax);
    if (num.test(c3Min)) p.set("c3Min", c3Min);
    if (num.test(c3Max)) p.set("c3Max", c3Max);
    if (owner) p.set("owner", owner);
    p.set("sort", sort);
    p.set("dir", dir);
    return `/api/tours?${p.toString()}`;
  }, [status, q, body, dvMin, dvMax, c3Min, c3Max, owner, sort, dir]);
  const isDefault = url === "/api/tours?sort=updated&dir=desc";
  const { data, error, isLoading } = useSWR<{ items: TourListItem[]; total: number }>(url, fetcher, {
    fallbackData: isDefault ? initial : undefined,
    keepPreviousData: true,
  });

  const toggleSort = (key: SortKey) => {
    if (key === sort) setDir(dir === "asc" ? "desc" : "asc");
    else {
      setSort(key);
      setDir(key === "name" || key === "owner" ? "asc" : "desc");
    }
  };
  const toggle = (id: number) =>
    setSelected((s) => (s.includes(id) ? s.filter((x) => x !== id) : s.length >= 6 ? s : [...s, id]));

  const items = data?.items ?? [];
  const filtered = Boolean(status || q || body || dvMin || dvMax || c3Min || c3Max || owner);

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-surface p-3">
        <label className="flex flex-col gap-1 text-xs text-muted">
          Search
          <input value={q} onChange={(e) => setQ(e.target.value)} placeholder="Tour name" aria-label="Search tours"
            className="h-9 w-56 rounded-md border border-line bg-sunken px-3 text-sm text-ink outline-none focus:border-accent" />
        </label>
        <label className="flex flex-col gap-1 text-xs text-muted">
          Status
          <select value={status} onChange={(e) => setStatus(e.target.value)} aria-label="Filter by status"
            className="h-9 rounded-md border border-line bg-sunken px-2 text-sm text-ink">
            <option value="">All</option>
            <option value="draft">Draft</option>
            <option value="in_review">In review</option>
            <option value="returned">Returned</option>
            <option value="baselined">Baselined</option>
          </select>
        </label>
        <label className="flex flex-col gap-1 text-xs text-muted">
          Body in chain
          <select value={body} onChange={(e) => setBody(e.target.value)} aria-label="Filter by body"
            className="h-9 rounded-md border border-line bg-sunken px-2 text-sm text-ink">
            <option value="">Any</option>
            {["mercury", "venus", "earth", "mars", "jupiter", "saturn", "uranus", "neptune", "pluto", "custom:"].map((b) => (
              <option key={b} value={b}>{b === "custom:" ? "Any custom body" : bodyLabel(b)}</option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-xs text-muted">
          Owner
          <select value={owner} onChange={(e) => setOwner(e.target.value)} aria-label="Filter by owner"
            className="h-9 rounded-md border border-line bg-sunken px-2 text-sm text-ink">
            <option value="">Anyone</option>
            {(members?.items ?? []).map((m) => (
              <option key={m.id} value={String(m.id)}>{m.name}</option>
            ))}
          </select>
        </label>
        <RangeFilter label="Total Δv (km/s)" name="total Δv" min={dvMin} max={dvMax} onMin={setDvMin} onMax={setDvMax} />
        <RangeFilter label="Launch C3 (km²/s²)" name="launch C3" min={c3Min} max={c3Max} onMin={setC3Min} onMax={setC3Max} />
        <div className="ml-auto flex items-center gap-2">
          {isLoading ? <Spinner label="Loading tours" /> : null}
          <span className="text-xs text-muted">{data ? `${data.total} tour${data.total === 1 ? "" : "s"}` : ""}</span>
          <LinkButton
            href={selected.length >= 2 ? `/compare?ids=${selected.join(",")}` : "#"}
            variant="secondary"
            size="sm"
            aria-disabled={selected.length < 2}
            className={selected.length < 2 ? "pointer-events-none opacity-50" : undefined}
          >
            Compare {selected.length ? `(${selected.length})` : ""}
          </LinkButton>
        </div>
      </div>

      {error ? (
        <div role="alert" className="rounded-md border border-bad/40 bg-bad-soft px-4 py-3 text-sm text-bad">
          Could not load tours: {error instanceof Error ? error.message : "unknown error"}
        </div>
      ) : null}

      {items.length === 0 && !isLoading ? (
        <EmptyState
          title={filtered ? "No tour matches these filters" : "No tours yet"}
          description={
            filtered
              ? "Clear a filter to see more of the team's tours."
              : canCreate
                ? "Create the first tour: chain a launch body, flybys and a target, then let the Workbench evaluate it."
                : "Tours the designers create will appear here."
          }
        />
      ) : (
        <div className="overflow-x-auto rounded-lg border border-line">
          <table className="w-full min-w-[980px] text-sm">
            <thead className="bg-raised text-left text-xs uppercase tracking-wide text-muted">
              <tr>
                <th className="w-10 px-3 py-2"><span className="sr-only">Select for Compare</span></th>
                {COLUMNS.map((c) => (
                  <th key={c.key} className={`px-3 py-2 font-medium ${c.className ?? ""}`} aria-sort={sort === c.key ? (dir === "asc" ? "ascending" : "descending") : "none"}>
                    <button type="button" onClick={() => toggleSort(c.key)} className="inline-flex items-center gap-1 hover:text-ink">
                      {c.label}
                      <span aria-hidden className="text-[10px]">{sort === c.key ? (dir === "asc" ? "▲" : "▼") : ""}</span>
                    </button>
                  </th>
                ))}
              </tr>
            </thead>
            <tbody className="divide-y divide-line bg-surface">
              {items.map((t) => (
                <tr key={t.id} className="hover:bg-raised/60">
                  <td className="px-3 py-2.5">
                    <input type="checkbox" aria-label={`Select ${t.name} for Compare`} checked={selected.includes(t.id)} onChange={() => toggle(t.id)}
                      className="h-4 w-4 accent-[var(--gy-accent)]" />
                  </td>
                  <td className="px-3 py-2.5">
                    <Link href={`/tours/${t.id}`} className="font-medium text-ink hover:text-accent">{t.name}</Link>
                    <div className="mt-0.5 text-xs text-muted">{t.chain.map(bodyLabel).join(" → ")}</div>
                  </td>
                  <td className="px-3 py-2.5 text-muted">{t.ownerName}</td>
                  <td className="px-3 py-2.5"><StatusBadge status={t.status} /></td>
                  <td className="num whitespace-nowrap px-3 py-2.5 text-right">{dateOf(t.launchTdbS)}</td>
                  <td className="px-3 py-2.5 text-right"><Num value={t.c3Km2S2} unit="km²/s²" digits={2} /></td>
                  <td className="px-3 py-2.5 text-right"><Num value={t.totalDvKmS} unit="km/s" digits={3} /></td>
                  <td className="px-3 py-2.5 text-right"><Num value={days(t.tofS)} unit="d" digits={0} /></td>
                  <td className="px-3 py-2.5 text-right"><Num value={t.arrivalVinfKmS} unit="km/s" digits={2} /></td>
                  <td className="px-3 py-2.5 text-right">
                    <Num value={t.minFlybyMarginKm} unit="km" digits={0} className={t.minFlybyMarginKm !== null && t.minFlybyMarginKm < 0 ? "text-bad" : undefined} />
                    {t.violationCount > 0 ? <div className="text-xs text-bad">{t.violationCount} violation{t.violationCount === 1 ? "" : "s"}</div> : null}
                  </td>
                  <td className="px-3 py-2.5 text-right text-xs text-muted">{stamp(t.updatedAt)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}

function RangeFilter(props: { label: string; name: string; min: string; max: string; onMin(v: string): void; onMax(v: string): void }) {
  const cls = "num h-9 w-20 rounded-md border border-line bg-sunken px-2 text-sm text-ink outline-none focus:border-accent";
  return (
    <fieldset className="flex flex-col gap-1 text-xs text-muted">
      <legend className="mb-1">{props.label}</legend>
      <span className="flex items-center gap-1">
        <input value={props.min} onChange={(e) => props.onMin(e.target.value)} inputMode="decimal" placeholder="min" aria-label={`Minimum ${props.name}`} className={cls} />
        <span aria-hidden>–</span>
        <input value={props.max} onChange={(e) => props.onMax(e.target.value)} inputMode="decimal" placeholder="max" aria-label={`Maximum ${props.name}`} className={cls} />
      </span>
    </fieldset>
  );
}
