"use client";

import Link from "next/link";
import { useState } from "react";
import useSWR from "swr";
import { ApiError, fetcher, sendJson } from "@/lib/client/fetcher";
import type { CatalogBody } from "@/lib/db/queries/catalog";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { Num } from "@/components/ui/num";
import { BodyForm } from "./body-form";
import { BodiesUpload } from "./bodies-upload";

export interface BodiesPanelProps {
  initial: { items: CatalogBody[]; total: number };
  canEdit: boolean;
}

/** The team's small bodies: list; add, edit, delete and upload for leads and designers. */
export function BodiesPanel({ initial, canEdit }: BodiesPanelProps) {
  const { data, mutate } = useSWR<{ items: CatalogBody[]; total: number }>("/api/bodies", fetcher, { fallbackData: initial });
  const items = data?.items ?? [];
  const [mode, setMode] = useState<{ kind: "none" } | { kind: "add" } | { kind: "edit"; body: CatalogBody } | { kind: "upload" }>({ kind: "none" });
  const [notice, setNotice] = useState<{ tone: "ok" | "bad"; text: string } | null>(null);
  const [deleting, setDeleting] = useState<number | null>(null);

  const remove = async (b: CatalogBody) => {
    if (!window.confirm(`Delete ${b.name} (${b.bodyId}) from the catalog?`)) return;
    setNotice(null);
    setDeleting(b.id);
    try {
      await sendJson(`/api/bodies/${b.id}`, "DELETE");
      setNotice({ tone: "ok", text: `Deleted ${b.name}.` });
      await mutate();
    } catch (ex) {
      setNotice({ tone: "bad", text: ex instanceof ApiError ? ex.message : "The server could not be reached; nothing was deleted." });
    } finally {
      setDeleting(null);
    }
  };

  return (
    <Card aria-labelledby="bodies-title">
      <CardHeader
        title={<span id="bodies-title">Team small bodies</span>}
        description="Asteroids and comets the team defines by osculating heliocentric elements (mean ecliptic and equinox of J2000). A chain can use them as flyby or arrival nodes by their id."
        actions={
          canEdit ? (
            <>
              <Button size="sm" variant={mode.kind === "upload" ? "primary" : "secondary"} onClick={() => setMode(mode.kind === "upload" ? { kind: "none" } : { kind: "upload" })}>
                Upload CSV
              </Button>
              <Button size="sm" variant={mode.kind === "add" ? "primary" : "secondary"} onClick={() => setMode(mode.kind === "add" ? { kind: "none" } : { kind: "add" })}>
                Add body
              </Button>
            </>
          ) : null
        }
      />
      {canEdit && mode.kind === "upload" ? (
        <CardBody className="border-b border-line bg-sunken/40">
          <BodiesUpload onImported={() => { setNotice(null); void mutate(); }} />
        </CardBody>
      ) : null}
      {canEdit && (mode.kind === "add" || mode.kind === "edit") ? (
        <CardBody className="border-b border-line bg-sunken/40">
          <h3 className="mb-3 text-sm font-semibold text-ink">{mode.kind === "edit" ? `Edit ${mode.body.name}` : "New small body"}</h3>
          <BodyForm
            key={mode.kind === "edit" ? mode.body.id : "new"}
            body={mode.kind === "edit" ? mode.body : undefined}
            onCancel={() => setMode({ kind: "none" })}
            onDone={(saved) => {
              setMode({ kind: "none" });
              setNotice({ tone: "ok", text: `Saved ${saved.name} (${saved.bodyId}).` });
              void mutate();
            }}
          />
        </CardBody>
      ) : null}
      {notice ? (
        <div className="px-5 pt-4">
          <p role={notice.tone === "bad" ? "alert" : "status"} className={notice.tone === "bad" ? "rounded-md border border-bad/40 bg-bad-soft px-3 py-2 text-sm text-bad" : "rounded-md border border-ok/40 bg-ok-soft px-3 py-2 text-sm text-ok"}>
            {notice.text}
          </p>
        </div>
      ) : null}
      {items.length === 0 ? (
        <CardBody>
          <EmptyState
            title="No small bodies yet"
            description={canEdit ? "Add one by form or upload a CSV of orbital elements; tours can then fly by or arrive at it." : "Leads and designers can add the team's small bodies here."}
          />
        </CardBody>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full min-w-[1100px] text-sm" aria-label="Team small bodies">
            <thead className="bg-raised text-left text-xs text-muted">
              <tr>
                <th className="px-4 py-2 font-medium">Name · id</th>
                <th className="px-3 py-2 font-medium">Epoch (UTC)</th>
                <th className="px-3 py-2 text-right font-medium" title="Semi-major axis">a</th>
                <th className="px-3 py-2 text-right font-medium">e</th>
                <th className="px-3 py-2 text-right font-medium">i</th>
                <th className="px-3 py-2 text-right font-medium">Ω</th>
                <th className="px-3 py-2 text-right font-medium">ω</th>
                <th className="px-3 py-2 text-right font-medium" title="Mean anomaly at epoch; true anomaly beneath">M · ν</th>
                <th className="px-3 py-2 text-right font-medium">GM</th>
                <th className="px-3 py-2 text-right font-medium">Radius · min alt</th>
                <th className="px-3 py-2 font-medium">Used by</th>
                {canEdit ? <th className="px-3 py-2"><span className="sr-only">Actions</span></th> : null}
              </tr>
            </thead>
            <tbody className="divide-y divide-line">
              {items.map((b) => (
                <tr key={b.id} data-body={b.bodyId}>
                  <th scope="row" className="px-4 py-2 text-left align-top font-medium text-ink">
                    {b.name}
                    <div className="font-mono text-xs font-normal text-faint">{b.bodyId}</div>
                  </th>
                  <td className="num px-3 py-2 align-top text-xs whitespace-nowrap text-muted">{b.input.epochUtc.replace("T", " ").replace(/:00Z$|Z$/, "")}</td>
                  <td className="px-3 py-2 text-right align-top"><Num value={b.aKm / 149597870.7} unit="AU" digits={4} /></td>
                  <td className="px-3 py-2 text-right align-top"><Num value={b.input.e} digits={4} /></td>
                  <td className="px-3 py-2 text-right align-top"><Num value={b.input.iDeg} unit="°" digits={2} /></td>
                  <td className="px-3 py-2 text-right align-top"><Num value={b.input.raanDeg} unit="°" digits={2} /></td>
                  <td className="px-3 py-2 text-right align-top"><Num value={b.input.argpDeg} unit="°" digits={2} /></td>
                  <td className="px-3 py-2 text-right align-top">
                    <Num value={b.input.mDeg} unit="°" digits={2} title="Mean anomaly at epoch" />
                    <div className="text-xs whitespace-nowrap text-muted" title="True anomaly at epoch">ν <Num value={b.nuDeg} unit="°" digits={2} /></div>
                  </td>
                  <td className="px-3 py-2 text-right align-top"><Num value={b.input.muKm3S2} unit="km³/s²" digits={3} /></td>
                  <td className="px-3 py-2 text-right align-top">
                    <Num value={b.input.radiusKm} unit="km" digits={1} />
                    <div className="text-xs whitespace-nowrap text-muted">min alt <Num value={b.input.minAltKm} unit="km" digits={0} /></div>
                  </td>
                  <td className="px-3 py-2 align-top text-xs">
                    {b.usedBy.length === 0 ? (
                      <span className="text-faint">no tour</span>
                    ) : (
                      <ul className="space-y-0.5">
                        {b.usedBy.map((t) => (
                          <li key={t.id}><Link href={`/tours/${t.id}`} className="text-ink hover:text-accent">{t.name}</Link></li>
                        ))}
                      </ul>
                    )}
                  </td>
                  {canEdit ? (
                    <td className="px-3 py-2 text-right align-top whitespace-nowrap">
                      <Button size="sm" variant="ghost" onClick={() => setMode({ kind: "edit", body: b })} aria-label={`Edit ${b.name}`}>Edit</Button>
                      <Button
                        size="sm"
                        variant="ghost"
                        onClick={() => remove(b)}
                        pending={deleting === b.id}
                        aria-label={`Delete ${b.name}`}
                        title={b.usedBy.length ? `Used by ${b.usedBy.length} tour(s): delete will be refused` : undefined}
                      >
                        Delete
                      </Button>
                    </td>
                  ) : null}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </Card>
  );
}
