/**
 * Route-handler tests of Catalog (bodies: list, add, edit, delete, CSV import), Files (tour
 * import, export as JSON / node CSV / CCSDS OEM) and Compare: roles, team scoping (another
 * team's record is 404), bad input (400 with line numbers, DB unchanged), size limits (413).
 * OEM layout: CCSDS 502.0-B Orbit Data Messages, KVN form (from memory); read back with the
 * tests' own reader.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { as, anonymous, call, ctx, req } from "../../support/api";
import { parseOemForTest } from "../../support/oem-reader";
import { migrateUp } from "@/lib/db/migrator";
import { seedE2E, E2E_PASSWORD } from "@/lib/db/seed";
import { AuditEvent, CustomBody, Team, Tour } from "@/models";
import * as bodiesRoute from "@/app/api/bodies/route";
import * as bodyRoute from "@/app/api/bodies/[id]/route";
import * as importBodiesRoute from "@/app/api/bodies/import/route";
import * as importTourRoute from "@/app/api/tours/import/route";
import * as exportRoute from "@/app/api/tours/[id]/export/route";
import * as compareRoute from "@/app/api/compare/route";
import * as toursRoute from "@/app/api/tours/route";
import { BODY_CSV_COLUMNS } from "@/lib/files/bodies-csv";
import { teamBodies } from "@/lib/db/queries/bodies";
import { evaluateStoredTour } from "@/lib/tours/evaluate";
import { ephemerisFromSpec } from "@/lib/astro/ephemeris";
import { isoToTdbSeconds } from "@/lib/astro/time";
import { parseStored } from "@/lib/db/queries/tours";

const PW = E2E_PASSWORD;
const HEADER = BODY_CSV_COLUMNS.join(",");
let alderTeamId = 0;
let wrenId = 0;
let kestrelId = 0;
let birchTourId = 0;
let aldraId = 0;
let birchBodyId = 0;

function rawReq(method: string, url: string, body: BodyInit, type: string): Request {
  return new Request(`http://localhost${url}`, { method, headers: { "content-type": type }, body });
}
const csvReq = (text: string) => rawReq("POST", "/api/bodies/import", text, "text/csv");
function multipartReq(url: string, text: string, filename: string, type: string): Request {
  const fd = new FormData();
  fd.append("file", new Blob([text], { type }), filename);
  return new Request(`http://localhost${url}`, { method: "POST", body: fd });
}
async function download(id: number, query: string): Promise<{ status: number; text: string; headers: Headers }> {
  const r = await exportRoute.GET(req("GET", `/api/tours/${id}/export?${query}`), ctx({ id: String(id) }));
  return { status: r.status, text: await r.text(), headers: r.headers };
}
const bodyCount = () => CustomBody.count({ where: { teamId: alderTeamId } });

const validBody = {
  name: "Brisa (invented)",
  epochUtc: "2031-03-01T00:00:00Z",
  aAu: 1.6,
  e: 0.12,
  iDeg: 2.5,
  raanDeg: 80,
  argpDeg: 30,
  mDeg: 45,
  muKm3S2: 0.8,
  radiusKm: 6.5,
  minAltKm: 40,
};

beforeAll(async () => {
  await migrateUp();
  await seedE2E();
  alderTeamId = (await Team.findOne({ where: { name: "Alder Flight Studio" } }))!.id;
  const birchTeamId = (await Team.findOne({ where: { name: "Birch Orbital" } }))!.id;
  wrenId = (await Tour.findOne({ where: { teamId: alderTeamId, name: "Wren — Mars rendezvous, 2028 window" } }))!.id;
  kestrelId = (await Tour.findOne({ where: { teamId: alderTeamId, name: "Kestrel — Jupiter via Venus and Earth" } }))!.id;
  birchTourId = (await Tour.findOne({ where: { name: "Birch private tour" } }))!.id;
  aldraId = (await CustomBody.findOne({ where: { teamId: alderTeamId, slug: "aldra" } }))!.id;
  const b = await CustomBody.create({
    teamId: birchTeamId, slug: "birch-rock", name: "Birch rock (invented)", epochTdbS: 0, aKm: 3e8, e: 0.1,
    iRad: 0.1, raanRad: 0, argpRad: 0, nuRad: 0, muKm3S2: 1, radiusKm: 1, minAltKm: 1,
  });
  birchBodyId = b.id;
});

describe("GET /api/bodies", () => {
  it("401 without a session", async () => {
    anonymous();
    expect((await call(bodiesRoute.GET(req("GET", "/api/bodies"), {}))).status).toBe(401);
  });

  it("lists the team's bodies for any role, in form units, with the tours that use each", async () => {
    await as("viewer@alder.example", PW);
    const r = await call(bodiesRoute.GET(req("GET", "/api/bodies"), {}));
    expect(r.status).toBe(200);
    const ids = r.body.items.map((b: { bodyId: string }) => b.bodyId);
    expect(ids).toEqual(expect.arrayContaining(["custom:aldra", "custom:corvin", "custom:tessaly"]));
    expect(ids).not.toContain("custom:birch-rock");
    const aldra = r.body.items.find((b: { bodyId: string }) => b.bodyId === "custom:aldra");
    expect(aldra.input.aAu).toBeCloseTo(2.31, 9);
    expect(aldra.nuDeg).toBeCloseTo(15, 9); // seeded as ν = 15°
    expect(aldra.input.mDeg).toBeLessThan(15); // mean anomaly behind the true anomaly just after perihelion
    expect(aldra.usedBy.map((t: { name: string }) => t.name)).toEqual(["Skua — Aldra flyby via Mars"]);
  });

  it("another team's body is 404 to GET", async () => {
    await as("viewer@alder.example", PW);
    expect((await call(bodyRoute.GET(req("GET", `/api/bodies/${birchBodyId}`), ctx({ id: String(birchBodyId) })))).status).toBe(404);
    expect((await call(bodyRoute.GET(req("GET", "/api/bodies/abc"), ctx({ id: "abc" })))).status).toBe(404);
  });
});

describe("POST /api/bodies", () => {
  it("403 for viewer and analyst; nothing is written", async () => {
    const before = await bodyCount();
    for (const who of ["viewer@alder.example", "analyst@alder.example"]) {
      await as(who, PW);
      const r = await call(bodiesRoute.POST(req("POST", "/api/bodies", validBody), {}));
      expect(r.status).toBe(403);
      expect(r.body.error).toBe("forbidden");
    }
    expect(await bodyCount()).toBe(before);
  });

  it("400 invalid_json for a body that is not JSON", async () => {
    await as("designer@alder.example", PW);
    const r = await call(bodiesRoute.POST(req("POST", "/api/bodies", undefined, "{nope"), {}));
    expect(r.status).toBe(400);
    expect(r.body.error).toBe("invalid_json");
  });

  it("400 with one issue per bad field", async () => {
    await as("designer@alder.example", PW);
    const r = await call(bodiesRoute.POST(req("POST", "/api/bodies", { ...validBody, e: 1.2, iDeg: 200, radiusKm: 0, epochUtc: "yesterday" }), {}));
    expect(r.status).toBe(400);
    const paths = r.body.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["e", "iDeg", "radiusKm", "epochUtc"]));
    const both = await call(bodiesRoute.POST(req("POST", "/api/bodies", { ...validBody, aKm: 2e8 }), {}));
    expect(both.status).toBe(400);
    expect(both.body.message).toMatch(/semi-major axis once/);
  });

  it("201 for a designer: slug from the name, mean anomaly stored as true anomaly, audit event", async () => {
    await as("designer@alder.example", PW);
    const r = await call(bodiesRoute.POST(req("POST", "/api/bodies", validBody), {}));
    expect(r.status).toBe(201);
    expect(r.body.bodyId).toBe("custom:brisa-invented");
    expect(r.body.input.mDeg).toBeCloseTo(45, 8);
    expect(r.body.nuDeg).toBeGreaterThan(45);
    const row = await CustomBody.findOne({ where: { teamId: alderTeamId, slug: "brisa-invented" } });
    expect(row!.nuRad).toBeCloseTo((r.body.nuDeg * Math.PI) / 180, 12);
    expect(await AuditEvent.count({ where: { action: "body.create", target: `body:${row!.id}` } })).toBe(1);
  });

  it("409 when the derived id is taken", async () => {
    await as("lead@alder.example", PW);
    const r = await call(bodiesRoute.POST(req("POST", "/api/bodies", { ...validBody, name: "BRISA  invented!" }), {}));
    expect(r.status).toBe(409);
    expect(r.body.error).toBe("duplicate_body");
    expect(r.body.message).toMatch(/custom:brisa-invented/);
  });
});

describe("PATCH and DELETE /api/bodies/[id]", () => {
  it("another team's body is 404 to PATCH and DELETE, for a viewer too (never 403)", async () => {
    for (const who of ["designer@alder.example", "viewer@alder.example"]) {
      await as(who, PW);
      const p = await call(bodyRoute.PATCH(req("PATCH", `/api/bodies/${birchBodyId}`, validBody), ctx({ id: String(birchBodyId) })));
      const d = await call(bodyRoute.DELETE(req("DELETE", `/api/bodies/${birchBodyId}`), ctx({ id: String(birchBodyId) })));
      expect(p.status).toBe(404);
      expect(d.status).toBe(404);
    }
    expect(await CustomBody.findByPk(birchBodyId)).not.toBeNull();
  });

  it("403 for a viewer on the team's own body", async () => {
    await as("viewer@alder.example", PW);
    const p = await call(bodyRoute.PATCH(req("PATCH", `/api/bodies/${aldraId}`, validBody), ctx({ id: String(aldraId) })));
    const d = await call(bodyRoute.DELETE(req("DELETE", `/api/bodies/${aldraId}`), ctx({ id: String(aldraId) })));
    expect(p.status).toBe(403);
    expect(d.status).toBe(403);
  });

  it("a designer edits name and elements; the body id stays, so tours keep working", async () => {
    await as("designer@alder.example", PW);
    const row = await CustomBody.findOne({ where: { teamId: alderTeamId, slug: "brisa-invented" } });
    const r = await call(bodyRoute.PATCH(req("PATCH", `/api/bodies/${row!.id}`, { ...validBody, name: "Brisa renamed (invented)", e: 0.2 }), ctx({ id: String(row!.id) })));
    expect(r.status).toBe(200);
    expect(r.body.bodyId).toBe("custom:brisa-invented");
    expect(r.body.name).toBe("Brisa renamed (invented)");
    expect(r.body.input.e).toBe(0.2);
    const bad = await call(bodyRoute.PATCH(req("PATCH", `/api/bodies/${row!.id}`, { ...validBody, e: -1 }), ctx({ id: String(row!.id) })));
    expect(bad.status).toBe(400);
  });

  it("editing a body re-evaluates the stored summary of the tours that pass through it", async () => {
    await as("designer@alder.example", PW);
    const skua = await Tour.findOne({ where: { teamId: alderTeamId, name: "Skua — Aldra flyby via Mars" } });
    const before = skua!.arrivalVinfKmS;
    const cur = await call(bodyRoute.GET(req("GET", `/api/bodies/${aldraId}`), ctx({ id: String(aldraId) })));
    expect(cur.status).toBe(200);
    const moved = { ...cur.body.input, raanDeg: (cur.body.input.raanDeg + 5) % 360 };
    const r = await call(bodyRoute.PATCH(req("PATCH", `/api/bodies/${aldraId}`, moved), ctx({ id: String(aldraId) })));
    expect(r.status).toBe(200);
    const after = await Tour.findByPk(skua!.id);
    expect(after!.arrivalVinfKmS).not.toBeCloseTo(before!, 6);
    const fresh = evaluateStoredTour(parseStored(after!.specJson), await teamBodies(alderTeamId));
    expect(after!.arrivalVinfKmS).toBeCloseTo(fresh.summary.arrivalVinfKmS!, 9);
    expect(after!.version).toBe(skua!.version);
    // Put Aldra back for the tests that follow.
    expect((await call(bodyRoute.PATCH(req("PATCH", `/api/bodies/${aldraId}`, cur.body.input), ctx({ id: String(aldraId) })))).status).toBe(200);
  });

  it("refuses to delete a body a tour uses, with 409 naming the tour", async () => {
    await as("lead@alder.example", PW);
    const r = await call(bodyRoute.DELETE(req("DELETE", `/api/bodies/${aldraId}`), ctx({ id: String(aldraId) })));
    expect(r.status).toBe(409);
    expect(r.body.error).toBe("body_in_use");
    expect(r.body.message).toMatch(/Skua — Aldra flyby via Mars/);
    expect(r.body.tours).toHaveLength(1);
    expect(await CustomBody.findByPk(aldraId)).not.toBeNull();
  });

  it("deletes an unused body", async () => {
    await as("designer@alder.example", PW);
    const row = await CustomBody.findOne({ where: { teamId: alderTeamId, slug: "brisa-invented" } });
    const r = await call(bodyRoute.DELETE(req("DELETE", `/api/bodies/${row!.id}`), ctx({ id: String(row!.id) })));
    expect(r.status).toBe(200);
    expect(await CustomBody.findByPk(row!.id)).toBeNull();
  });
});

describe("POST /api/bodies/import", () => {
  const good = [
    HEADER,
    "Ostra (invented),2031-01-01T00:00:00Z,1.55,0.11,3.2,45,60,10,0.4,4.2,25",
    "Pelin (invented),2031-01-01T00:00:00Z,2.4,0.2,7.5,150,250,300,1.3,11,60",
  ].join("\n");

  it("403 for a viewer", async () => {
    await as("viewer@alder.example", PW);
    const r = await call(importBodiesRoute.POST(csvReq(good), {}));
    expect(r.status).toBe(403);
  });

  it("one bad row rejects the whole file with 400 naming that line, and the DB is unchanged", async () => {
    await as("designer@alder.example", PW);
    const before = await bodyCount();
    const text = [HEADER, good.split("\n")[1], "Bad (invented),2031-01-01T00:00:00Z,2.4,1.5,7.5,150,250,300,1.3,11,60", good.split("\n")[2]].join("\n");
    const r = await call(importBodiesRoute.POST(csvReq(text), {}));
    expect(r.status).toBe(400);
    expect(r.body.error).toBe("invalid_csv");
    expect(r.body.rows).toEqual([{ line: 3, reasons: [expect.stringMatching(/^e: e must be < 1/)] }]);
    expect(r.body.message).toMatch(/line 3/);
    expect(r.body.issues[0].path).toBe("line 3");
    expect(await bodyCount()).toBe(before);
    expect(await CustomBody.count({ where: { slug: "ostra-invented" } })).toBe(0);
  });

  it("a row that names a body already in the catalog is a bad row too", async () => {
    await as("designer@alder.example", PW);
    const before = await bodyCount();
    const r = await call(importBodiesRoute.POST(csvReq(`${HEADER}\nAldra,2031-01-01T00:00:00Z,2,0.1,1,1,1,1,1,1,1\n`), {}));
    expect(r.status).toBe(400);
    expect(r.body.rows[0].line).toBe(2);
    expect(r.body.rows[0].reasons[0]).toMatch(/already has custom:aldra/);
    expect(await bodyCount()).toBe(before);
  });

  it("413 for a file over the size limit, 400 for too many rows, 400 for an empty file", async () => {
    await as("designer@alder.example", PW);
    const before = await bodyCount();
    const big = HEADER + "\n" + "x".repeat(300 * 1024);
    const r = await call(importBodiesRoute.POST(csvReq(big), {}));
    expect(r.status).toBe(413);
    expect(r.body.error).toBe("too_large");
    expect(r.body.message).toMatch(/256 kB/);
    const bigMultipart = await call(importBodiesRoute.POST(multipartReq("/api/bodies/import", big, "big.csv", "text/csv"), {}));
    expect(bigMultipart.status).toBe(413);
    const rows = Array.from({ length: 501 }, (_, k) => `Rock ${k} (invented),2031-01-01T00:00:00Z,2,0.1,1,1,1,1,1,1,1`);
    const many = await call(importBodiesRoute.POST(csvReq([HEADER, ...rows].join("\n")), {}));
    expect(many.status).toBe(400);
    expect(many.body.error).toBe("too_many_rows");
    expect(many.body.message).toMatch(/at most 500/);
    const empty = await call(importBodiesRoute.POST(csvReq(""), {}));
    expect(empty.status).toBe(400);
    expect(await bodyCount()).toBe(before);
  });

  it("a good file (multipart) adds every body, listed by GET, and they work as tour nodes", async () => {
    await as("designer@alder.example", PW);
    const before = await bodyCount();
    const r = await call(importBodiesRoute.POST(multipartReq("/api/bodies/import", good, "bodies.csv", "text/csv"), {}));
    expect(r.status).toBe(201);
    expect(r.body.total).toBe(2);
    expect(await bodyCount()).toBe(before + 2);
    const list = await call(bodiesRoute.GET(req("GET", "/api/bodies"), {}));
    expect(list.body.items.map((b: { bodyId: string }) => b.bodyId)).toEqual(expect.arrayContaining(["custom:ostra-invented", "custom:pelin-invented"]));
    expect(await AuditEvent.count({ where: { action: "body.import", teamId: alderTeamId } })).toBe(1);

    // A chain through the new body: Earth → Ostra (flyby) → Mars, evaluated on the server.
    const t = (iso: string) => isoToTdbSeconds(iso);
    const tour = {
      formatVersion: 1,
      ephemeris: { kind: "mean" },
      nodes: [
        { id: "l", body: "earth", epoch: t("2031-02-01T00:00:00Z") },
        { id: "o", body: "custom:ostra-invented", epoch: t("2031-08-01T00:00:00Z") },
        { id: "m", body: "mars", epoch: t("2032-03-01T00:00:00Z") },
      ],
    };
    const created = await call(toursRoute.POST(req("POST", "/api/tours", { name: "Through Ostra (invented)", tour }), {}));
    expect(created.status).toBe(201);
    expect(created.body.result).not.toBeNull();
    expect(created.body.result.violations.filter((v: { kind: string }) => v.kind === "no_solution")).toEqual([]);
    expect(created.body.result.flybys[0].body).toBe("custom:ostra-invented");
    expect(Number.isFinite(created.body.c3Km2S2)).toBe(true);
    // and now the body is in use: delete is refused
    const ostra = await CustomBody.findOne({ where: { teamId: alderTeamId, slug: "ostra-invented" } });
    const del = await call(bodyRoute.DELETE(req("DELETE", `/api/bodies/${ostra!.id}`), ctx({ id: String(ostra!.id) })));
    expect(del.status).toBe(409);
    expect(del.body.message).toMatch(/Through Ostra/);
  });
});

describe("POST /api/tours/import", () => {
  it("403 for analyst and viewer", async () => {
    for (const who of ["viewer@alder.example", "analyst@alder.example"]) {
      await as(who, PW);
      const r = await call(importTourRoute.POST(req("POST", "/api/tours/import", { tour: {} }), {}));
      expect(r.status).toBe(403);
    }
  });

  it("400 for bad JSON and for an invalid tour, with issues", async () => {
    await as("designer@alder.example", PW);
    const before = await Tour.count();
    const bad = await call(importTourRoute.POST(req("POST", "/api/tours/import", undefined, "{\"tour\": "), {}));
    expect(bad.status).toBe(400);
    expect(bad.body.error).toBe("invalid_json");
    const invalid = await call(importTourRoute.POST(req("POST", "/api/tours/import", { name: "x", tour: { formatVersion: 2, nodes: [] } }), {}));
    expect(invalid.status).toBe(400);
    expect(invalid.body.issues.length).toBeGreaterThan(0);
    expect(await Tour.count()).toBe(before);
  });

  it("an exported tour file imports back as a new tour with the same chain", async () => {
    await as("designer@alder.example", PW);
    const file = await download(kestrelId, "format=json");
    expect(file.status).toBe(200);
    expect(file.headers.get("content-disposition")).toMatch(/^attachment; filename="kestrel-jupiter-via-venus-and-earth-\d+\.tour\.json"$/);
    const parsed = JSON.parse(file.text);
    expect(parsed).toMatchObject({ kind: "gybe-tour", formatVersion: 1, name: "Kestrel — Jupiter via Venus and Earth" });
    const r = await call(importTourRoute.POST(multipartReq("/api/tours/import", file.text, "k.tour.json", "application/json"), {}));
    expect(r.status).toBe(201);
    expect(r.body.name).toBe("Kestrel — Jupiter via Venus and Earth");
    expect(r.body.id).not.toBe(kestrelId);
    expect(r.body.tour.nodes).toEqual(parsed.tour.nodes);
    const orig = await Tour.findByPk(kestrelId);
    expect(r.body.c3Km2S2).toBeCloseTo(orig!.c3Km2S2!, 9);
  });

  it("accepts a bare stored tour and names it", async () => {
    await as("lead@alder.example", PW);
    const orig = parseStored((await Tour.findByPk(wrenId))!.specJson);
    const r = await call(importTourRoute.POST(req("POST", "/api/tours/import", orig), {}));
    expect(r.status).toBe(201);
    expect(r.body.name).toMatch(/^Imported tour \(launch \d{4}-\d{2}-\d{2}\)$/);
  });

  it("400 when the tour uses a body the team's catalog does not have", async () => {
    await as("designer@birch.example", PW);
    const before = await Tour.count();
    const skua = await Tour.findOne({ where: { teamId: alderTeamId, name: "Skua — Aldra flyby via Mars" } });
    const r = await call(importTourRoute.POST(req("POST", "/api/tours/import", { name: "stolen", tour: JSON.parse(skua!.specJson) }), {}));
    expect(r.status).toBe(400);
    expect(r.body.message).toMatch(/custom:aldra/);
    expect(await Tour.count()).toBe(before);
  });

  it("413 for an oversize file", async () => {
    await as("designer@alder.example", PW);
    const r = await call(importTourRoute.POST(req("POST", "/api/tours/import", { name: "x".repeat(600 * 1024) }), {}));
    expect(r.status).toBe(413);
  });
});

describe("GET /api/tours/[id]/export", () => {
  it("another team's tour is 404; bad format and step are 400", async () => {
    await as("viewer@alder.example", PW);
    expect((await download(birchTourId, "format=json")).status).toBe(404);
    expect((await download(kestrelId, "format=xml")).status).toBe(400);
    expect((await download(kestrelId, "format=oem&step=0")).status).toBe(400);
    expect((await download(kestrelId, "format=oem&step=abc")).status).toBe(400);
    expect((await download(kestrelId, "format=oem&step=400")).status).toBe(400);
    const tiny = await download(kestrelId, "format=oem&step=0.01");
    expect(tiny.status).toBe(400);
    expect(JSON.parse(tiny.text).message).toMatch(/at least [\d.]+ days/);
  });

  it("node CSV for a viewer: one row per node with the server's numbers", async () => {
    await as("viewer@alder.example", PW);
    const f = await download(kestrelId, "format=csv");
    expect(f.status).toBe(200);
    expect(f.headers.get("content-type")).toMatch(/text\/csv/);
    expect(f.headers.get("content-disposition")).toMatch(/\.nodes\.csv"$/);
    const lines = f.text.trimEnd().split("\r\n");
    const tour = parseStored((await Tour.findByPk(kestrelId))!.specJson);
    expect(lines).toHaveLength(tour.nodes.length + 1);
    const head = lines[0]!.split(",");
    const c3 = Number(lines[1]!.split(",")[head.indexOf("c3_km2_s2")]);
    expect(c3).toBeCloseTo((await Tour.findByPk(kestrelId))!.c3Km2S2!, 3);
  });

  it("OEM: positions at every node epoch equal the bodies' positions; velocities are the Lambert velocities", async () => {
    await as("viewer@alder.example", PW);
    const f = await download(kestrelId, "format=oem&step=5");
    expect(f.status).toBe(200);
    expect(f.headers.get("content-disposition")).toMatch(/\.oem"$/);
    const oem = parseOemForTest(f.text);
    expect(oem.header.ORIGINATOR).toBe("GYBE");
    const tour = parseStored((await Tour.findByPk(kestrelId))!.specJson);
    const bodies = await teamBodies(alderTeamId);
    const { spec, result } = evaluateStoredTour(tour, bodies);
    const eph = ephemerisFromSpec({ kind: tour.ephemeris.kind, cached: false, customBodies: bodies });
    expect(oem.segments).toHaveLength(tour.nodes.length - 1);
    const d = (a: ArrayLike<number>, b: ArrayLike<number>) => Math.hypot(a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!);
    oem.segments.forEach((s, k) => {
      expect(s.meta).toMatchObject({ CENTER_NAME: "SUN", REF_FRAME: "ECLIPJ2000", TIME_SYSTEM: "TDB", OBJECT_ID: `GYBE-TOUR-${kestrelId}` });
      const a = spec.nodes[k]!;
      const b = spec.nodes[k + 1]!;
      const first = s.states[0]!;
      const last = s.states.at(-1)!;
      expect(Math.abs(first.t - a.epoch)).toBeLessThan(1e-3);
      expect(Math.abs(last.t - b.epoch)).toBeLessThan(1e-3);
      expect(d(first.r, eph.state(a.body, a.epoch).r)).toBeLessThan(0.01); // km
      expect(d(last.r, eph.state(b.body, b.epoch).r)).toBeLessThan(5); // km, Lambert + propagation
      expect(d(first.v, result.legs[k]!.v1)).toBeLessThan(1e-9);
      expect(d(last.v, result.legs[k]!.v2)).toBeLessThan(1e-5);
      expect(s.states[1]!.t - s.states[0]!.t).toBeCloseTo(5 * 86400, 3);
    });
  });
});

describe("GET /api/compare", () => {
  const get = (q: string) => call(compareRoute.GET(req("GET", `/api/compare?${q}`), {}));

  it("401 without a session", async () => {
    anonymous();
    expect((await get(`ids=${wrenId},${kestrelId}`)).status).toBe(401);
  });

  it("400 for 1 or 7 ids and for a malformed list", async () => {
    await as("viewer@alder.example", PW);
    expect((await get(`ids=${wrenId}`)).status).toBe(400);
    expect((await get(`ids=${wrenId},${wrenId}`)).status).toBe(400); // one tour twice is one tour
    expect((await get("ids=1,2,3,4,5,6,7")).status).toBe(400);
    expect((await get("ids=1;2")).status).toBe(400);
    expect((await get("")).status).toBe(400);
  });

  it("another team's id answers 404", async () => {
    await as("lead@alder.example", PW);
    const r = await get(`ids=${wrenId},${birchTourId}`);
    expect(r.status).toBe(404);
  });

  it("a viewer compares two tours: summaries, per-flyby margins and the Δv budget, in the order asked", async () => {
    await as("viewer@alder.example", PW);
    const r = await get(`ids=${kestrelId},${wrenId}`);
    expect(r.status).toBe(200);
    expect(r.body.items.map((i: { id: number }) => i.id)).toEqual([kestrelId, wrenId]);
    const k = r.body.items[0];
    const row = (await Tour.findByPk(kestrelId))!;
    expect(k.c3Km2S2).toBeCloseTo(row.c3Km2S2!, 9);
    const kTour = parseStored(row.specJson);
    expect(k.flybys.map((f: { body: string }) => f.body)).toEqual(kTour.nodes.slice(1, -1).map((n) => n.body));
    expect(k.flybys.length).toBeGreaterThanOrEqual(2);
    for (const f of k.flybys) {
      expect(f.marginKm).toBeCloseTo(f.rpKm - f.rpMinKm, 6);
    }
    expect(Math.min(...k.flybys.map((f: { marginKm: number }) => f.marginKm))).toBeCloseTo(row.minFlybyMarginKm!, 6);
    expect(k.dv.flybyDvKmS + k.dv.arrivalDvKmS).toBeCloseTo(k.dv.totalDvKmS, 9);
    expect(k.nodes[0].role).toBe("launch");
    const w = r.body.items[1];
    expect(w.flybys).toEqual([]);
    // capture into rp = 3796.19 km, e = 0.9 at Mars: Δv = √(v∞² + 2μ/rp) − √(μ(1 + e)/rp) (Curtis ch. 8, from memory)
    const mu = 42828.375214;
    const rp = 3396.19 + 400;
    expect(w.arrivalKind).toBe("capture");
    expect(w.dv.arrivalDvKmS).toBeCloseTo(Math.sqrt(w.arrivalVinfKmS ** 2 + (2 * mu) / rp) - Math.sqrt((mu * 1.9) / rp), 9);
  });
});
