/**
 * Route-handler tests of the foundation: sessions and lock-out, tours with roles, team scoping
 * and optimistic locking, members and Outbox. Each file runs on its own temporary SQLite file.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { as, anonymous, call, ctx, req } from "../../support/api";
import { migrateUp } from "@/lib/db/migrator";
import { seedE2E, E2E_PASSWORD } from "@/lib/db/seed";
import { Tour, SignInThrottle } from "@/models";
import * as sessionRoute from "@/app/api/session/route";
import * as toursRoute from "@/app/api/tours/route";
import * as tourRoute from "@/app/api/tours/[id]/route";
import * as membersRoute from "@/app/api/team/members/route";
import * as outboxRoute from "@/app/api/outbox/route";
import * as healthRoute from "@/app/api/health/route";

const PW = E2E_PASSWORD;
let alderTourId = 0;
let birchTourId = 0;
let baselinedId = 0;

beforeAll(async () => {
  await migrateUp();
  await seedE2E();
  const alder = await Tour.findOne({ where: { name: "Kestrel — Jupiter via Venus and Earth" } });
  const birch = await Tour.findOne({ where: { name: "Birch private tour" } });
  const base = await Tour.findOne({ where: { status: "baselined", name: "Wren — Mars rendezvous, 2028 window" } });
  alderTourId = alder!.id;
  birchTourId = birch!.id;
  baselinedId = base!.id;
});

describe("health", () => {
  it("answers ok with the dialect", async () => {
    const r = await call(healthRoute.GET());
    expect(r.status).toBe(200);
    expect(r.body).toEqual({ ok: true, database: "sqlite" });
  });
});

describe("session", () => {
  it("rejects a body that is not JSON with 400 invalid_json", async () => {
    anonymous();
    const r = await call(sessionRoute.POST(req("POST", "/api/session", undefined, "{not json"), {}));
    expect(r.status).toBe(400);
    expect(r.body.error).toBe("invalid_json");
    expect(r.body.message).toMatch(/JSON/);
  });

  it("reports each bad field with 400", async () => {
    anonymous();
    const r = await call(sessionRoute.POST(req("POST", "/api/session", { email: "nope", password: "" }), {}));
    expect(r.status).toBe(400);
    const paths = r.body.issues.map((i: { path: string }) => i.path);
    expect(paths).toContain("email");
    expect(paths).toContain("password");
  });

  it("answers 401 with a message that does not say whether the address exists", async () => {
    anonymous();
    const known = await call(sessionRoute.POST(req("POST", "/api/session", { email: "viewer@alder.example", password: "wrong-password" }), {}));
    const unknown = await call(sessionRoute.POST(req("POST", "/api/session", { email: "nobody@alder.example", password: "wrong-password" }), {}));
    expect(known.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(known.body.message).toBe(unknown.body.message);
  });

  it("locks an address after five failures, for unknown addresses too, and the sixth try is refused", async () => {
    anonymous();
    for (const email of ["lockout@alder.example", "ghost@nowhere.example"]) {
      for (let i = 0; i < 5; i++) {
        const r = await call(sessionRoute.POST(req("POST", "/api/session", { email, password: `bad-${i}` }), {}));
        expect(r.status).toBe(401);
      }
      const sixth = await call(sessionRoute.POST(req("POST", "/api/session", { email, password: email.startsWith("lockout") ? PW : "x" }), {}));
      expect(sixth.status).toBe(429);
      expect(sixth.body.error).toBe("locked");
      expect(sixth.body.message).toMatch(/15 minutes/);
    }
    const row = await SignInThrottle.findOne({ where: { email: "ghost@nowhere.example" } });
    expect(row?.lockedUntil).toBeTruthy();
  });

  it("a success resets the failure count", async () => {
    anonymous();
    for (let i = 0; i < 4; i++) await call(sessionRoute.POST(req("POST", "/api/session", { email: "analyst@alder.example", password: "bad" }), {}));
    await as("analyst@alder.example", PW);
    const row = await SignInThrottle.findOne({ where: { email: "analyst@alder.example" } });
    expect(row?.failures).toBe(0);
  });

  it("GET returns the signed-in user and DELETE signs out", async () => {
    await as("designer@alder.example", PW);
    const me = await call(sessionRoute.GET(req("GET", "/api/session"), {}));
    expect(me.body.user).toMatchObject({ email: "designer@alder.example", role: "designer", teamName: "Alder Flight Studio" });
    expect(me.body.user.passwordHash).toBeUndefined();
    await call(sessionRoute.DELETE(req("DELETE", "/api/session"), {}));
    const after = await call(sessionRoute.GET(req("GET", "/api/session"), {}));
    expect(after.body.user).toBeNull();
  });
});

describe("tours", () => {
  it("401 without a session", async () => {
    anonymous();
    const r = await call(toursRoute.GET(req("GET", "/api/tours"), {}));
    expect(r.status).toBe(401);
  });

  it("lists only the team's tours as { items, total }", async () => {
    await as("viewer@alder.example", PW);
    const r = await call(toursRoute.GET(req("GET", "/api/tours?sort=name&dir=asc"), {}));
    expect(r.status).toBe(200);
    expect(r.body.total).toBe(r.body.items.length);
    expect(r.body.items.map((t: { name: string }) => t.name)).not.toContain("Birch private tour");
    const names = r.body.items.map((t: { name: string }) => t.name);
    expect([...names].sort((a: string, b: string) => a.localeCompare(b))).toEqual(names);
  });

  it("filters by status and rejects an unknown sort key with 400", async () => {
    await as("viewer@alder.example", PW);
    const r = await call(toursRoute.GET(req("GET", "/api/tours?status=baselined"), {}));
    expect(r.body.items.every((t: { status: string }) => t.status === "baselined")).toBe(true);
    const bad = await call(toursRoute.GET(req("GET", "/api/tours?sort=bogus"), {}));
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe("sort");
  });

  it("filters by owner and by Δv and C3 ranges", async () => {
    await as("viewer@alder.example", PW);
    const all = (await call(toursRoute.GET(req("GET", "/api/tours"), {}))).body.items as { ownerId: number; totalDvKmS: number; c3Km2S2: number }[];
    const owner = all[0]!.ownerId;
    const byOwner = await call(toursRoute.GET(req("GET", `/api/tours?owner=${owner}`), {}));
    expect(byOwner.body.items.length).toBeGreaterThan(0);
    expect(byOwner.body.items.every((t: { ownerId: number }) => t.ownerId === owner)).toBe(true);
    const ranged = await call(toursRoute.GET(req("GET", "/api/tours?dvMin=0.5&dvMax=2&c3Min=9&c3Max=12"), {}));
    const expected = all.filter((t) => t.totalDvKmS >= 0.5 && t.totalDvKmS <= 2 && t.c3Km2S2 >= 9 && t.c3Km2S2 <= 12);
    expect(ranged.body.total).toBe(expected.length);
    expect(ranged.body.total).toBeGreaterThan(0);
    const bad = await call(toursRoute.GET(req("GET", "/api/tours?dvMin=fast"), {}));
    expect(bad.status).toBe(400);
  });

  it("a viewer cannot create a tour (403)", async () => {
    await as("viewer@alder.example", PW);
    const r = await call(toursRoute.POST(req("POST", "/api/tours", { name: "Nope" }), {}));
    expect(r.status).toBe(403);
  });

  it("a designer creates a tour; the summary is the server's own, not the browser's", async () => {
    await as("designer@alder.example", PW);
    const r = await call(toursRoute.POST(req("POST", "/api/tours", { name: "  Trial arc  ", totalDvKmS: 0.001 }), {}));
    expect(r.status).toBe(201);
    expect(r.body.name).toBe("Trial arc");
    expect(r.body.version).toBe(1);
    expect(r.body.status).toBe("draft");
    expect(r.body.totalDvKmS).not.toBe(0.001);
    expect(r.body.c3Km2S2).toBeGreaterThan(0);
  });

  it("rejects a malformed tour with per-field issues", async () => {
    await as("designer@alder.example", PW);
    const r = await call(
      toursRoute.POST(req("POST", "/api/tours", { name: "", tour: { formatVersion: 1, ephemeris: { kind: "nope" }, nodes: [] } }), {}),
    );
    expect(r.status).toBe(400);
    const paths = r.body.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["name", "tour.ephemeris.kind", "tour.nodes"]));
  });

  it("rejects a chain through a custom body the team does not have", async () => {
    await as("designer@alder.example", PW);
    const r = await call(
      toursRoute.POST(
        req("POST", "/api/tours", {
          name: "Ghost body",
          tour: { formatVersion: 1, ephemeris: { kind: "mean" }, nodes: [{ id: "a", body: "earth", epoch: 9e8 }, { id: "b", body: "custom:ghost", epoch: 9.2e8 }] },
        }),
        {},
      ),
    );
    expect(r.status).toBe(400);
    expect(r.body.message).toMatch(/custom:ghost/);
  });

  it("another team's tour answers 404 to GET, PATCH and DELETE", async () => {
    await as("lead@alder.example", PW);
    expect((await call(tourRoute.GET(req("GET", `/api/tours/${birchTourId}`), ctx({ id: String(birchTourId) })))).status).toBe(404);
    expect((await call(tourRoute.PATCH(req("PATCH", `/api/tours/${birchTourId}`, { version: 1, name: "x" }), ctx({ id: String(birchTourId) })))).status).toBe(404);
    expect((await call(tourRoute.DELETE(req("DELETE", `/api/tours/${birchTourId}`), ctx({ id: String(birchTourId) })))).status).toBe(404);
    expect((await call(tourRoute.GET(req("GET", "/api/tours/abc"), ctx({ id: "abc" })))).status).toBe(404);
  });

  it("a stale version gets 409 with the current tour; the owner may overwrite", async () => {
    await as("designer@alder.example", PW);
    const cur = await call(tourRoute.GET(req("GET", `/api/tours/${alderTourId}`), ctx({ id: String(alderTourId) })));
    const v = cur.body.version as number;
    const ok = await call(tourRoute.PATCH(req("PATCH", `/api/tours/${alderTourId}`, { version: v, name: "Kestrel (renamed)" }), ctx({ id: String(alderTourId) })));
    expect(ok.status).toBe(200);
    expect(ok.body.version).toBe(v + 1);
    const stale = await call(tourRoute.PATCH(req("PATCH", `/api/tours/${alderTourId}`, { version: v, name: "Stale edit" }), ctx({ id: String(alderTourId) })));
    expect(stale.status).toBe(409);
    expect(stale.body.error).toBe("stale_version");
    expect(stale.body.current.version).toBe(v + 1);
    expect(stale.body.current.name).toBe("Kestrel (renamed)");
    const forced = await call(
      tourRoute.PATCH(req("PATCH", `/api/tours/${alderTourId}`, { version: v, name: "Kestrel — Jupiter via Venus and Earth", overwrite: true }), ctx({ id: String(alderTourId) })),
    );
    expect(forced.status).toBe(200);
    expect(forced.body.version).toBe(v + 2);
  });

  it("an analyst may change aim points but not the chain", async () => {
    await as("analyst@alder.example", PW);
    const cur = await call(tourRoute.GET(req("GET", `/api/tours/${alderTourId}`), ctx({ id: String(alderTourId) })));
    const tour = cur.body.tour;
    const aimed = { ...tour, aim: { venus: { bT: 8000, bR: -2000, sigmaT: 10, sigmaR: 15, rho: 0.1, pole: "ecliptic" } } };
    const ok = await call(tourRoute.PATCH(req("PATCH", `/api/tours/${alderTourId}`, { version: cur.body.version, tour: aimed }), ctx({ id: String(alderTourId) })));
    expect(ok.status).toBe(200);
    expect(ok.body.tour.aim.venus.bT).toBe(8000);
    const moved = { ...aimed, nodes: aimed.nodes.map((n: { epoch: number }, i: number) => (i === 1 ? { ...n, epoch: n.epoch + 86400 } : n)) };
    const denied = await call(tourRoute.PATCH(req("PATCH", `/api/tours/${alderTourId}`, { version: ok.body.version, tour: moved }), ctx({ id: String(alderTourId) })));
    expect(denied.status).toBe(403);
  });

  it("a baselined tour is read-only (409)", async () => {
    await as("lead@alder.example", PW);
    const cur = await call(tourRoute.GET(req("GET", `/api/tours/${baselinedId}`), ctx({ id: String(baselinedId) })));
    const r = await call(tourRoute.PATCH(req("PATCH", `/api/tours/${baselinedId}`, { version: cur.body.version, name: "x" }), ctx({ id: String(baselinedId) })));
    expect(r.status).toBe(409);
    expect(r.body.error).toBe("read_only");
  });

  it("PATCH without a version is a 400, not a 500", async () => {
    await as("designer@alder.example", PW);
    const r = await call(tourRoute.PATCH(req("PATCH", `/api/tours/${alderTourId}`, { name: "x" }), ctx({ id: String(alderTourId) })));
    expect(r.status).toBe(400);
    expect(r.body.issues[0].path).toBe("version");
  });

  it("only a lead deletes", async () => {
    await as("designer@alder.example", PW);
    const created = await call(toursRoute.POST(req("POST", "/api/tours", { name: "To delete" }), {}));
    const id = String(created.body.id);
    expect((await call(tourRoute.DELETE(req("DELETE", `/api/tours/${id}`), ctx({ id })))).status).toBe(403);
    await as("lead@alder.example", PW);
    expect((await call(tourRoute.DELETE(req("DELETE", `/api/tours/${id}`), ctx({ id })))).status).toBe(200);
    expect((await call(tourRoute.GET(req("GET", `/api/tours/${id}`), ctx({ id })))).status).toBe(404);
  });
});

describe("team and outbox", () => {
  it("members of the caller's team only", async () => {
    await as("viewer@alder.example", PW);
    const r = await call(membersRoute.GET(req("GET", "/api/team/members"), {}));
    expect(r.status).toBe(200);
    expect(r.body.items.every((m: { email: string }) => m.email.endsWith("@alder.example"))).toBe(true);
    expect(r.body.items[0].passwordHash).toBeUndefined();
  });

  it("Outbox is for the lead only", async () => {
    await as("designer@alder.example", PW);
    expect((await call(outboxRoute.GET(req("GET", "/api/outbox"), {}))).status).toBe(403);
    await as("lead@alder.example", PW);
    const r = await call(outboxRoute.GET(req("GET", "/api/outbox"), {}));
    expect(r.status).toBe(200);
    expect(r.body.total).toBeGreaterThan(0);
  });
});
