/**
 * A team's custom small body as people type it (form, CSV row, JSON): osculating heliocentric
 * elements in the mean ecliptic and equinox of J2000, degrees, AU or km, an ISO UTC epoch and
 * the *mean* anomaly. One valibot schema for the form, the route handlers and the CSV import;
 * `bodyRecordOf` turns a valid input into what the database stores (km, rad, TDB s, true anomaly).
 */
import * as v from "valibot";
import { AU_KM } from "@/lib/astro/constants";
import { isoToTdbSeconds, tdbSecondsToIso } from "@/lib/astro/time";
import { meanToTrueAnomaly, trueToMeanAnomaly } from "@/lib/astro/anomaly";

const DEG = Math.PI / 180;
/** Equatorial radius of the Sun, km (IAU 2015 Resolution B3 nominal value, from memory). */
const SUN_RADIUS_KM = 695_700;
/** ±300 years around J2000 (as for tour epochs). */
const EPOCH_LIMIT_S = 300 * 365.25 * 86400;
const MAX_A_AU = 1000;

/** Lower-case letters, digits and dashes from a name: "Aldra (invented)" → "aldra-invented". */
export function slugify(name: string): string {
  return name
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 48)
    .replace(/-+$/g, "");
}

const num = (label: string) => v.number(`${label} must be a number`);
const finite = (label: string) => v.finite(`${label} must be a finite number`);

function epochOk(iso: string): boolean {
  try {
    const t = isoToTdbSeconds(iso);
    return Math.abs(t) <= EPOCH_LIMIT_S;
  } catch {
    return false;
  }
}

export const bodyInputSchema = v.pipe(
  v.object({
    name: v.pipe(
      v.string("name must be text"),
      v.trim(),
      v.minLength(1, "name is required"),
      v.maxLength(120, "name is at most 120 characters"),
      v.check((s) => slugify(s).length > 0, "name needs at least one letter or digit (the body id is made from it)"),
    ),
    epochUtc: v.pipe(
      v.string("epoch must be an ISO date (UTC), e.g. 2030-01-01T00:00:00Z"),
      v.trim(),
      v.check(epochOk, "epoch must be an ISO date (UTC) such as 2030-01-01T00:00:00Z, within 300 years of 2000"),
    ),
    aAu: v.optional(v.pipe(num("a (AU)"), finite("a (AU)"), v.gtValue(0, "a must be > 0 AU"), v.maxValue(MAX_A_AU, `a must be at most ${MAX_A_AU} AU (was it given in km? use a_km)`))),
    aKm: v.optional(v.pipe(num("a (km)"), finite("a (km)"), v.gtValue(0, "a must be > 0 km"), v.maxValue(MAX_A_AU * AU_KM, `a must be at most ${MAX_A_AU} AU`))),
    e: v.pipe(num("e"), finite("e"), v.minValue(0, "e must be ≥ 0"), v.ltValue(1, "e must be < 1 (an ellipse)")),
    iDeg: v.pipe(num("i"), finite("i"), v.minValue(0, "i must be in [0°, 180°]"), v.maxValue(180, "i must be in [0°, 180°]")),
    raanDeg: v.pipe(num("Ω"), finite("Ω"), v.minValue(-360, "Ω must be in [−360°, 360°]"), v.maxValue(360, "Ω must be in [−360°, 360°]")),
    argpDeg: v.pipe(num("ω"), finite("ω"), v.minValue(-360, "ω must be in [−360°, 360°]"), v.maxValue(360, "ω must be in [−360°, 360°]")),
    mDeg: v.pipe(num("M"), finite("M"), v.minValue(-360, "M must be in [−360°, 360°]"), v.maxValue(360, "M must be in [−360°, 360°]")),
    muKm3S2: v.pipe(num("μ"), finite("μ"), v.gtValue(0, "μ must be > 0 km³/s²"), v.maxValue(1e6, "μ must be at most 1e6 km³/s² (a small body)")),
    radiusKm: v.pipe(num("radius"), finite("radius"), v.gtValue(0, "radius must be > 0 km"), v.maxValue(100_000, "radius must be at most 100,000 km")),
    minAltKm: v.pipe(num("minimum altitude"), finite("minimum altitude"), v.minValue(0, "minimum altitude must be ≥ 0 km"), v.maxValue(10_000_000, "minimum altitude must be at most 10,000,000 km")),
  }),
  v.check((b) => (b.aAu === undefined) !== (b.aKm === undefined), "give the semi-major axis once: a in AU or a in km"),
  v.forward(
    v.check((b) => {
      const a = b.aKm ?? (b.aAu ?? 0) * AU_KM;
      return !(a > 0) || !(b.e >= 0 && b.e < 1) || a * (1 - b.e) > SUN_RADIUS_KM; // other checks report bad a or e
    }, "perihelion a(1 − e) must be outside the Sun (> 695,700 km)"),
    ["e"],
  ),
);

export type BodyInput = v.InferOutput<typeof bodyInputSchema>;

/** What the database stores for a body (km, rad, TDB s past J2000, true anomaly). */
export interface BodyRecord {
  slug: string;
  name: string;
  epochTdbS: number;
  aKm: number;
  e: number;
  iRad: number;
  raanRad: number;
  argpRad: number;
  nuRad: number;
  muKm3S2: number;
  radiusKm: number;
  minAltKm: number;
}

const wrapDeg = (x: number) => ((x % 360) + 360) % 360;

/** A valid input → the stored record; the mean anomaly becomes the true anomaly (Kepler's equation). */
export function bodyRecordOf(input: BodyInput): BodyRecord {
  const aKm = input.aKm ?? input.aAu! * AU_KM;
  return {
    slug: slugify(input.name),
    name: input.name,
    epochTdbS: isoToTdbSeconds(input.epochUtc),
    aKm,
    e: input.e,
    iRad: input.iDeg * DEG,
    raanRad: wrapDeg(input.raanDeg) * DEG,
    argpRad: wrapDeg(input.argpDeg) * DEG,
    nuRad: meanToTrueAnomaly(wrapDeg(input.mDeg) * DEG, input.e),
    muKm3S2: input.muKm3S2,
    radiusKm: input.radiusKm,
    minAltKm: input.minAltKm,
  };
}

/** A stored record → the form's values (AU, degrees, mean anomaly, ISO UTC), for editing and display. */
export function bodyInputOf(r: Omit<BodyRecord, "slug">): BodyInput {
  const round = (x: number, d: number) => Number(x.toFixed(d));
  return {
    name: r.name,
    epochUtc: tdbSecondsToIso(r.epochTdbS).replace(/\.000Z$/, "Z"),
    aAu: round(r.aKm / AU_KM, 12),
    e: r.e,
    iDeg: round(r.iRad / DEG, 10),
    raanDeg: round(r.raanRad / DEG, 10),
    argpDeg: round(r.argpRad / DEG, 10),
    mDeg: round(trueToMeanAnomaly(r.nuRad, r.e) / DEG, 10),
    muKm3S2: r.muKm3S2,
    radiusKm: r.radiusKm,
    minAltKm: r.minAltKm,
  };
}
