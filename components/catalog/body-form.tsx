"use client";

import { useState, type FormEvent } from "react";
import * as v from "valibot";
import { bodyInputSchema, slugify, type BodyInput } from "@/lib/validation/body";
import { ApiError, sendJson } from "@/lib/client/fetcher";
import { Button } from "@/components/ui/button";
import { Field, SelectField } from "@/components/ui/field";
import type { CatalogBody } from "@/lib/db/queries/catalog";

type Key = "name" | "epochUtc" | "a" | "e" | "iDeg" | "raanDeg" | "argpDeg" | "mDeg" | "muKm3S2" | "radiusKm" | "minAltKm";
type Values = Record<Key, string>;

const EMPTY: Values = { name: "", epochUtc: "", a: "", e: "", iDeg: "", raanDeg: "", argpDeg: "", mDeg: "", muKm3S2: "", radiusKm: "", minAltKm: "" };

function valuesOf(b: BodyInput): Values {
  const s = (x: number | undefined) => (x === undefined ? "" : String(x));
  return {
    name: b.name,
    epochUtc: b.epochUtc,
    a: s(b.aAu ?? b.aKm),
    e: s(b.e),
    iDeg: s(b.iDeg),
    raanDeg: s(b.raanDeg),
    argpDeg: s(b.argpDeg),
    mDeg: s(b.mDeg),
    muKm3S2: s(b.muKm3S2),
    radiusKm: s(b.radiusKm),
    minAltKm: s(b.minAltKm),
  };
}

/** Text → number for the schema; blank stays undefined (the schema then says "must be a number"). */
function n(s: string): number | undefined {
  const t = s.trim().replace(/\u2212/g, "-");
  if (t === "") return undefined;
  const x = Number(t);
  return Number.isNaN(x) ? (t as unknown as number) : x;
}

const FIELD_OF_PATH: Record<string, Key> = { aAu: "a", aKm: "a" };

export interface BodyFormProps {
  /** The body to edit; a new body when absent. */
  body?: CatalogBody;
  onDone: (saved: CatalogBody) => void;
  onCancel: () => void;
}

/** Add or edit a small body: osculating heliocentric elements (mean ecliptic and equinox of J2000). */
export function BodyForm({ body, onDone, onCancel }: BodyFormProps) {
  const [vals, setVals] = useState<Values>(body ? valuesOf(body.input) : EMPTY);
  const [aUnit, setAUnit] = useState<"au" | "km">(body?.input.aKm !== undefined ? "km" : "au");
  const [errors, setErrors] = useState<Partial<Record<Key, string>>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  const set = (k: Key) => (e: { target: { value: string } }) => setVals((s) => ({ ...s, [k]: e.target.value }));
  const err = (k: Key) => errors[k] ?? null;

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    setFormError(null);
    const input = {
      name: vals.name,
      epochUtc: vals.epochUtc,
      ...(aUnit === "au" ? { aAu: n(vals.a) } : { aKm: n(vals.a) }),
      e: n(vals.e),
      iDeg: n(vals.iDeg),
      raanDeg: n(vals.raanDeg),
      argpDeg: n(vals.argpDeg),
      mDeg: n(vals.mDeg),
      muKm3S2: n(vals.muKm3S2),
      radiusKm: n(vals.radiusKm),
      minAltKm: n(vals.minAltKm),
    };
    const r = v.safeParse(bodyInputSchema, input);
    const aMissing = vals.a.trim() === "";
    if (!r.success || aMissing) {
      const next: Partial<Record<Key, string>> = {};
      if (aMissing) next.a = `a is required (${aUnit === "au" ? "AU" : "km"})`;
      const issues = r.success ? [] : r.issues;
      for (const i of issues) {
        const p = v.getDotPath(i);
        const k = p ? (FIELD_OF_PATH[p] ?? (p as Key)) : null;
        if (k && !next[k]) next[k] = i.message;
        else if (!k) setFormError(i.message);
      }
      setErrors(next);
      return;
    }
    setErrors({});
    if (!r.success) return;
    setPending(true);
    try {
      const saved = body
        ? await sendJson<CatalogBody>(`/api/bodies/${body.id}`, "PATCH", r.output)
        : await sendJson<CatalogBody>("/api/bodies", "POST", r.output);
      onDone(saved);
    } catch (ex) {
      if (ex instanceof ApiError) {
        const next: Partial<Record<Key, string>> = {};
        for (const i of ex.issues) {
          const k = FIELD_OF_PATH[i.path] ?? (i.path as Key);
          if (k in EMPTY) next[k] = i.message;
        }
        setErrors(next);
        setFormError(ex.message);
      } else setFormError("The server could not be reached; nothing was saved.");
    } finally {
      setPending(false);
    }
  };

  const slug = slugify(vals.name);
  return (
    <form onSubmit={submit} noValidate aria-label={body ? `Edit ${body.name}` : "Add a small body"} className="space-y-4">
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <Field
          label="Name"
          value={vals.name}
          onChange={set("name")}
          error={err("name")}
          hint={body ? `Body id stays custom:${body.slug}` : slug ? `Body id custom:${slug}` : "The body id is made from the name"}
          className="sm:col-span-2"
          autoComplete="off"
        />
        <Field label="Epoch (UTC)" value={vals.epochUtc} onChange={set("epochUtc")} error={err("epochUtc")} placeholder="2031-01-01T00:00:00Z" hint="ISO date, UTC" className="sm:col-span-2" />
        <div className="flex gap-2">
          <Field label="Semi-major axis a" value={vals.a} onChange={set("a")} error={err("a")} inputMode="decimal" className="flex-1" />
          <SelectField label="Unit" value={aUnit} onChange={(e) => setAUnit(e.target.value as "au" | "km")} className="w-24">
            <option value="au">AU</option>
            <option value="km">km</option>
          </SelectField>
        </div>
        <Field label="Eccentricity e" value={vals.e} onChange={set("e")} error={err("e")} inputMode="decimal" hint="0 ≤ e < 1" />
        <Field label="Inclination i" unit="deg" value={vals.iDeg} onChange={set("iDeg")} error={err("iDeg")} inputMode="decimal" hint="to the ecliptic, 0–180°" />
        <Field label="Ascending node Ω" unit="deg" value={vals.raanDeg} onChange={set("raanDeg")} error={err("raanDeg")} inputMode="decimal" />
        <Field label="Argument of perihelion ω" unit="deg" value={vals.argpDeg} onChange={set("argpDeg")} error={err("argpDeg")} inputMode="decimal" />
        <Field label="Mean anomaly M" unit="deg" value={vals.mDeg} onChange={set("mDeg")} error={err("mDeg")} inputMode="decimal" hint="at the epoch; stored as true anomaly" />
        <Field label="GM μ" unit="km³/s²" value={vals.muKm3S2} onChange={set("muKm3S2")} error={err("muKm3S2")} inputMode="decimal" />
        <Field label="Radius" unit="km" value={vals.radiusKm} onChange={set("radiusKm")} error={err("radiusKm")} inputMode="decimal" />
        <Field label="Min flyby altitude" unit="km" value={vals.minAltKm} onChange={set("minAltKm")} error={err("minAltKm")} inputMode="decimal" />
      </div>
      {formError ? (
        <p role="alert" className="rounded-md border border-bad/40 bg-bad-soft px-3 py-2 text-sm text-bad">{formError}</p>
      ) : null}
      <div className="flex justify-end gap-2">
        <Button variant="ghost" onClick={onCancel} disabled={pending}>Cancel</Button>
        <Button type="submit" variant="primary" pending={pending}>{body ? "Save body" : "Add body"}</Button>
      </div>
    </form>
  );
}
