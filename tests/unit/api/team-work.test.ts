/**
 * Route-handler tests of team work: revisions (list, compare, restore), review transitions,
 * comments and mentions, member changes, invitations end to end, and the audit trail.
 * Every endpoint: allowed roles succeed, others 401/403, another team's record 404, bad input 400,
 * stale version and wrong state 409. Runs on its own temporary SQLite file.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { as, anonymous, call, ctx, req } from "../../support/api";
import { useJar } from "../../support/cookie-jar";
import { migrateUp } from "@/lib/db/migrator";
import { seedE2E, E2E_PASSWORD } from "@/lib/db/seed";
import { AuditEvent, Comment, Invitation, MailMessage, Tour, TourRevision, User } from "@/models";
import * as tourRoute from "@/app/api/tours/[id]/route";
import * as revisionsRoute from "@/app/api/tours/[id]/revisions/route";
import * as reviewRoute from "@/app/api/tours/[id]/review/route";
import * as commentsRoute from "@/app/api/tours/[id]/comments/route";
import * as commentRoute from "@/app/api/tours/[id]/comments/[commentId]/route";
import * as membersRoute from "@/app/api/team/members/route";
import * as memberRoute from "@/app/api/team/members/[userId]/route";
import * as invitationsRoute from "@/app/api/team/invitations/route";
import * as invitationRoute from "@/app/api/team/invitations/[invitationId]/route";
import * as acceptRoute from "@/app/api/invitations/[token]/route";
import * as auditRoute from "@/app/api/audit/route";

const PW = E2E_PASSWORD;
const ids: Record<string, number> = {};

const LEAD = "lead@alder.example";
const DESIGNER = "designer@alder.example";
const ANALYST = "analyst@alder.example";
const VIEWER = "viewer@alder.example";
const BIRCH_LEAD = "lead@birch.example";

beforeAll(async () => {
  await migrateUp();
  await seedE2E();
  for (const [key, name] of [
    ["kestrel", "Kestrel — Jupiter via Venus and Earth"],
    ["petrel", "Petrel — Saturn tour study"],
    ["skua", "Skua — Aldra flyby via Mars"],
    ["wren", "Wren — Mars rendezvous, 2028 window"],
    ["birch", "Birch private tour"],
  ] as const) {
    ids[key] = (await Tour.findOne({ where: { name } }))!.id;
  }
});

const tid = (key: string) => ({ id: String(ids[key]) });
const version = async (key: string) => (await Tour.findByPk(ids[key]))!.version;
const mailTo = (to: string) => MailMessage.findAll({ where: { to }, order: [["id", "ASC"]] });

async function review(key: string, body: unknown, raw?: string) {
  return call(reviewRoute.POST(req("POST", `/api/tours/${ids[key]}/review`, body, raw), ctx(tid(key))));
}

describe("revisions", () => {
  it("lists revisions with author, note, time and summary, to every role of the team", async () => {
    await as(VIEWER, PW);
    const r = await call(revisionsRoute.GET(req("GET", `/api/tours/${ids.kestrel}/revisions`), ctx(tid("kestrel"))));
    expect(r.status).toBe(200);
    expect(r.body.total).toBe(1);
    const [first] = r.body.items;
    expect(first).toMatchObject({ version: 1, authorName: "Dev Designer", note: "created (demo data)" });
    expect(typeof first.createdAt).toBe("string");
    expect(first.summary.name).toBe("Kestrel — Jupiter via Venus and Earth");
    expect(first.summary.c3Km2S2).toBeGreaterThan(0);
  });

  it("answers 401 signed out, 404 for another team's tour and for a bad id", async () => {
    anonymous();
    expect((await call(revisionsRoute.GET(req("GET", `/api/tours/${ids.kestrel}/revisions`), ctx(tid("kestrel"))))).status).toBe(401);
    await as(BIRCH_LEAD, PW);
    expect((await call(revisionsRoute.GET(req("GET", `/api/tours/${ids.kestrel}/revisions`), ctx(tid("kestrel"))))).status).toBe(404);
    expect((await call(revisionsRoute.GET(req("GET", `/api/tours/${ids.kestrel}/revisions?compare=1,1`), ctx(tid("kestrel"))))).status).toBe(404);
    expect((await call(revisionsRoute.GET(req("GET", "/api/tours/abc/revisions"), ctx({ id: "abc" })))).status).toBe(404);
  });

  it("rejects a malformed compare with 400 and an unknown version with 404", async () => {
    await as(VIEWER, PW);
    const bad = await call(revisionsRoute.GET(req("GET", `/api/tours/${ids.kestrel}/revisions?compare=1;2`), ctx(tid("kestrel"))));
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe("compare");
    const missing = await call(revisionsRoute.GET(req("GET", `/api/tours/${ids.kestrel}/revisions?compare=1,99`), ctx(tid("kestrel"))));
    expect(missing.status).toBe(404);
    expect(missing.body.message).toMatch(/Revision 99/);
  });

  it("diffs two revisions: epochs in days, moved/added nodes, aim, legs, arrival and key numbers", async () => {
    await as(DESIGNER, PW);
    const cur = await call(tourRoute.GET(req("GET", `/api/tours/${ids.petrel}`), ctx(tid("petrel"))));
    const tour = structuredClone(cur.body.tour);
    tour.nodes[1].epoch += 10 * 86400; // venus 10 days later
    tour.arrival = { kind: "rendezvous" };
    tour.aim = { venus: { bT: 5000, bR: -2000, sigmaT: 10, sigmaR: 10, rho: 0, pole: "ecliptic" } };
    const saved = await call(tourRoute.PATCH(req("PATCH", `/api/tours/${ids.petrel}`, { version: cur.body.version, tour }), ctx(tid("petrel"))));
    expect(saved.status).toBe(200);
    const v2 = saved.body.version as number;

    const r = await call(revisionsRoute.GET(req("GET", `/api/tours/${ids.petrel}/revisions?compare=1,${v2}`), ctx(tid("petrel"))));
    expect(r.status).toBe(200);
    expect(r.body.from.version).toBe(1);
    expect(r.body.to.version).toBe(v2);
    const d = r.body.diff;
    expect(d.identical).toBe(false);
    expect(d.nodes.epochs).toHaveLength(1);
    expect(d.nodes.epochs[0]).toMatchObject({ id: "venus", body: "venus" });
    expect(d.nodes.epochs[0].deltaDays).toBeCloseTo(10, 9);
    expect(d.arrival).toEqual({ from: "flyby", to: "rendezvous" });
    expect(d.aim).toEqual([expect.objectContaining({ nodeId: "venus", change: "added" })]);
    expect(d.changedMetrics).toContain("c3"); // the launch leg's arrival date moved
    expect(d.metrics.find((m: { key: string }) => m.key === "tof")).toBeTruthy();

    // Same revision against itself: nothing changed.
    const same = await call(revisionsRoute.GET(req("GET", `/api/tours/${ids.petrel}/revisions?compare=${v2},${v2}`), ctx(tid("petrel"))));
    expect(same.body.diff.identical).toBe(true);
  });

  it("restores an older version as a new revision (designer), re-evaluated by the server", async () => {
    await as(DESIGNER, PW);
    const v = await version("petrel");
    const r = await call(revisionsRoute.POST(req("POST", `/api/tours/${ids.petrel}/revisions`, { restoreVersion: 1, version: v }), ctx(tid("petrel"))));
    expect(r.status).toBe(201);
    expect(r.body.version).toBe(v + 1);
    expect(r.body.tour.arrival).toEqual({ kind: "flyby" });
    const first = await TourRevision.findOne({ where: { tourId: ids.petrel, version: 1 } });
    expect(JSON.parse((await Tour.findByPk(ids.petrel))!.specJson)).toEqual(JSON.parse(first!.specJson));
    const list = await call(revisionsRoute.GET(req("GET", `/api/tours/${ids.petrel}/revisions`), ctx(tid("petrel"))));
    expect(list.body.items[0]).toMatchObject({ version: v + 1, note: "restored version 1", authorName: "Dev Designer" });
    const back = await call(revisionsRoute.GET(req("GET", `/api/tours/${ids.petrel}/revisions?compare=1,${v + 1}`), ctx(tid("petrel"))));
    expect(back.body.diff.identical).toBe(true);
  });

  it("refuses restore to analyst and viewer (403), a stale version (409), bad input (400), another team (404)", async () => {
    const v = await version("petrel");
    const url = `/api/tours/${ids.petrel}/revisions`;
    for (const who of [ANALYST, VIEWER]) {
      await as(who, PW);
      const r = await call(revisionsRoute.POST(req("POST", url, { restoreVersion: 1, version: v }), ctx(tid("petrel"))));
      expect(r.status).toBe(403);
    }
    await as(LEAD, PW);
    const stale = await call(revisionsRoute.POST(req("POST", url, { restoreVersion: 1, version: v - 1 }), ctx(tid("petrel"))));
    expect(stale.status).toBe(409);
    expect(stale.body.error).toBe("stale_version");
    expect(stale.body.current.version).toBe(v);
    expect((await call(revisionsRoute.POST(req("POST", url, undefined, "{oops"), ctx(tid("petrel"))))).body.error).toBe("invalid_json");
    const missing = await call(revisionsRoute.POST(req("POST", url, { version: v }), ctx(tid("petrel"))));
    expect(missing.status).toBe(400);
    expect(missing.body.issues[0].path).toBe("restoreVersion");
    expect((await call(revisionsRoute.POST(req("POST", url, { restoreVersion: 42, version: v }), ctx(tid("petrel"))))).status).toBe(404);
    await as(BIRCH_LEAD, PW);
    expect((await call(revisionsRoute.POST(req("POST", url, { restoreVersion: 1, version: v }), ctx(tid("petrel"))))).status).toBe(404);
    expect(await version("petrel")).toBe(v);
  });

  it("a baselined tour cannot be restored (409 read_only)", async () => {
    await as(LEAD, PW);
    const r = await call(revisionsRoute.POST(req("POST", `/api/tours/${ids.wren}/revisions`, { restoreVersion: 1, version: await version("wren") }), ctx(tid("wren"))));
    expect(r.status).toBe(409);
    expect(r.body.error).toBe("read_only");
  });
});

describe("review", () => {
  it("refuses submit to analyst and viewer (403) and to another team (404)", async () => {
    for (const who of [ANALYST, VIEWER]) {
      await as(who, PW);
      expect((await review("petrel", { action: "submit", version: await version("petrel") })).status).toBe(403);
    }
    await as(BIRCH_LEAD, PW);
    expect((await review("petrel", { action: "submit", version: await version("petrel") })).status).toBe(404);
    anonymous();
    expect((await review("petrel", { action: "submit", version: 1 })).status).toBe(401);
  });

  it("rejects bad JSON, an unknown action and a missing version with 400", async () => {
    await as(DESIGNER, PW);
    expect((await review("petrel", undefined, "not json")).body.error).toBe("invalid_json");
    const bad = await review("petrel", { action: "approve", version: 1 });
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe("action");
    expect((await review("petrel", { action: "submit" })).status).toBe(400);
  });

  it("a designer submits a draft: status, version, revision, audit and an e-mail to the leads", async () => {
    await as(DESIGNER, PW);
    const v = await version("petrel");
    const before = (await mailTo(LEAD)).length;
    const r = await review("petrel", { action: "submit", comment: "Ready for a look.", version: v });
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ status: "in_review", version: v + 1, notified: [LEAD] });
    expect(r.body.tour.status).toBe("in_review");
    const rev = await TourRevision.findOne({ where: { tourId: ids.petrel, version: v + 1 } });
    expect(rev!.note).toBe("submitted for review: Ready for a look.");
    expect(JSON.parse(rev!.summaryJson).status).toBe("in_review");
    expect(await AuditEvent.count({ where: { action: "tour.review.submit", target: `tour:${ids.petrel}` } })).toBe(1);
    expect(await Comment.count({ where: { tourId: ids.petrel, body: "Submitted for review: Ready for a look." } })).toBe(1);
    const mails = await mailTo(LEAD);
    expect(mails.length).toBe(before + 1);
    expect(mails.at(-1)!.subject).toBe("Review requested: Petrel — Saturn tour study");
    expect(mails.at(-1)!.text).toContain(`/tours/${ids.petrel}`);
  });

  it("a designer may not baseline or return (403); submitting again is the wrong state (409)", async () => {
    await as(DESIGNER, PW);
    const v = await version("petrel");
    expect((await review("petrel", { action: "baseline", version: v })).status).toBe(403);
    expect((await review("petrel", { action: "return", comment: "x", version: v })).status).toBe(403);
    const again = await review("petrel", { action: "submit", version: v });
    expect(again.status).toBe(409);
    expect(again.body.error).toBe("wrong_state");
    expect(again.body.message).toMatch(/in review/);
  });

  it("return needs a comment (400), a current version (409), then e-mails the submitter", async () => {
    await as(LEAD, PW);
    const v = await version("petrel");
    for (const comment of [undefined, "   "]) {
      const r = await review("petrel", { action: "return", comment, version: v });
      expect(r.status).toBe(400);
      expect(r.body.issues[0].path).toBe("comment");
    }
    const stale = await review("petrel", { action: "return", comment: "Venus date is off.", version: v - 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toBe("stale_version");
    const before = (await mailTo(DESIGNER)).length;
    const ok = await review("petrel", { action: "return", comment: "Venus date is off.", version: v });
    expect(ok.status).toBe(200);
    expect(ok.body.status).toBe("returned");
    expect(ok.body.notified).toEqual([DESIGNER]); // the owner is the lead who acted; the designer submitted
    const mails = await mailTo(DESIGNER);
    expect(mails.length).toBe(before + 1);
    expect(mails.at(-1)!.subject).toBe("Petrel — Saturn tour study was returned");
    expect(mails.at(-1)!.text).toContain("Venus date is off.");
    expect(await Comment.count({ where: { tourId: ids.petrel, body: "Returned: Venus date is off." } })).toBe(1);
    expect((await review("petrel", { action: "baseline", version: v + 1 })).status).toBe(409);
  });

  it("baseline makes a tour read-only; reopen needs a comment and goes back to draft", async () => {
    await as(LEAD, PW);
    const v = await version("kestrel");
    const b = await review("kestrel", { action: "baseline", version: v });
    expect(b.status).toBe(200);
    expect(b.body.status).toBe("baselined");
    expect(b.body.notified).toContain(DESIGNER);
    await as(DESIGNER, PW);
    const edit = await call(tourRoute.PATCH(req("PATCH", `/api/tours/${ids.kestrel}`, { version: v + 1, name: "edited" }), ctx(tid("kestrel"))));
    expect(edit.status).toBe(409);
    expect(edit.body.error).toBe("read_only");
    expect((await review("kestrel", { action: "reopen", comment: "why", version: v + 1 })).status).toBe(403);
    await as(LEAD, PW);
    const noComment = await review("kestrel", { action: "reopen", version: v + 1 });
    expect(noComment.status).toBe(400);
    const re = await review("kestrel", { action: "reopen", comment: "Launch vehicle changed; rework the window.", version: v + 1 });
    expect(re.status).toBe(200);
    expect(re.body).toMatchObject({ status: "draft", version: v + 2 });
    const notes = (await TourRevision.findAll({ where: { tourId: ids.kestrel }, order: [["version", "ASC"]] })).map((r) => r.note);
    expect(notes.slice(-2)).toEqual(["baselined", "reopened: Launch vehicle changed; rework the window."]);
  });

  it("a returned tour can be submitted again", async () => {
    await as(DESIGNER, PW);
    const r = await review("skua", { action: "submit", version: await version("skua") });
    expect(r.status).toBe(200);
    expect(r.body.status).toBe("in_review");
  });
});

describe("comments", () => {
  const url = () => `/api/tours/${ids.skua}/comments`;
  const post = (body: unknown, raw?: string) => call(commentsRoute.POST(req("POST", url(), body, raw), ctx(tid("skua"))));

  it("lists comments with author names to every role; another team gets 404", async () => {
    await as(VIEWER, PW);
    const r = await call(commentsRoute.GET(req("GET", url()), ctx(tid("skua"))));
    expect(r.status).toBe(200);
    expect(r.body.total).toBeGreaterThanOrEqual(1);
    expect(r.body.items[0]).toMatchObject({ authorName: "Ana Lead", nodeId: null, canDelete: false });
    await as(BIRCH_LEAD, PW);
    expect((await call(commentsRoute.GET(req("GET", url()), ctx(tid("skua"))))).status).toBe(404);
    expect((await post({ body: "hello" })).status).toBe(404);
  });

  it("a viewer may not comment (403); signed out is 401", async () => {
    await as(VIEWER, PW);
    expect((await post({ body: "hello" })).status).toBe(403);
    anonymous();
    expect((await post({ body: "hello" })).status).toBe(401);
  });

  it("validates body and nodeId (400)", async () => {
    await as(ANALYST, PW);
    expect((await post(undefined, "{")).body.error).toBe("invalid_json");
    expect((await post({ body: "  " })).status).toBe(400);
    expect((await post({ body: "x".repeat(4001) })).status).toBe(400);
    const unknownNode = await post({ body: "pinned", nodeId: "saturn" });
    expect(unknownNode.status).toBe(400);
    expect(unknownNode.body.issues[0].path).toBe("nodeId");
    expect((await post({ body: "pinned", nodeId: "bad id!" })).status).toBe(400);
  });

  it("an analyst pins a comment to a node; ?nodeId= filters", async () => {
    await as(ANALYST, PW);
    const r = await post({ body: "Mars periapsis looks tight.", nodeId: "mars" });
    expect(r.status).toBe(201);
    expect(r.body.comment).toMatchObject({ authorName: "Ari Analyst", nodeId: "mars", canDelete: true });
    expect(r.body.mentioned).toEqual([]);
    const pinned = await call(commentsRoute.GET(req("GET", `${url()}?nodeId=mars`), ctx(tid("skua"))));
    expect(pinned.body.items.map((c: { body: string }) => c.body)).toEqual(["Mars periapsis looks tight."]);
  });

  it("@-mentions by first name, full name or e-mail local part e-mail those members, not the author", async () => {
    await as(DESIGNER, PW);
    const before = { ari: (await mailTo(ANALYST)).length, ana: (await mailTo(LEAD)).length, vic: (await mailTo(VIEWER)).length, dev: (await mailTo(DESIGNER)).length };
    const r = await post({ body: "@Ari can you check the Mars pass? cc @Ana Lead and @viewer; write to me at dev@designer.example or @dev" });
    expect(r.status).toBe(201);
    expect(r.body.mentioned.map((m: { name: string }) => m.name)).toEqual(["Ari Analyst", "Ana Lead", "Vic Viewer"]);
    expect((await mailTo(ANALYST)).length).toBe(before.ari + 1);
    expect((await mailTo(LEAD)).length).toBe(before.ana + 1);
    expect((await mailTo(VIEWER)).length).toBe(before.vic + 1);
    expect((await mailTo(DESIGNER)).length).toBe(before.dev);
    const m = (await mailTo(ANALYST)).at(-1)!;
    expect(m.subject).toBe("Dev Designer mentioned you on Skua — Aldra flyby via Mars");
    expect(m.text).toContain(`/tours/${ids.skua}/discussion#comment-${r.body.comment.id}`);
  });

  it("the author or a lead may delete a comment; others 403; unknown 404", async () => {
    await as(ANALYST, PW);
    const mine = await post({ body: "to be deleted" });
    const other = await post({ body: "the lead removes this" });
    await as(DESIGNER, PW);
    const del = (id: number) => call(commentRoute.DELETE(req("DELETE", `${url()}/${id}`), ctx({ id: String(ids.skua), commentId: String(id) })));
    expect((await del(mine.body.comment.id)).status).toBe(403);
    await as(VIEWER, PW);
    expect((await del(mine.body.comment.id)).status).toBe(403);
    await as(BIRCH_LEAD, PW);
    expect((await del(mine.body.comment.id)).status).toBe(404);
    await as(ANALYST, PW);
    expect((await del(mine.body.comment.id)).status).toBe(200);
    expect((await del(mine.body.comment.id)).status).toBe(404);
    await as(LEAD, PW);
    expect((await del(other.body.comment.id)).status).toBe(200);
    expect(await Comment.count({ where: { id: [mine.body.comment.id, other.body.comment.id] } })).toBe(0);
  });
});

describe("team members", () => {
  const patch = (userId: number, body: unknown, raw?: string) =>
    call(memberRoute.PATCH(req("PATCH", `/api/team/members/${userId}`, body, raw), ctx({ userId: String(userId) })));
  const uid = async (email: string) => (await User.findOne({ where: { email } }))!.id;

  it("only a lead may change members (401/403)", async () => {
    const target = await uid(VIEWER);
    anonymous();
    expect((await patch(target, { role: "analyst" })).status).toBe(401);
    for (const who of [DESIGNER, ANALYST, VIEWER]) {
      await as(who, PW);
      expect((await patch(target, { role: "analyst" })).status).toBe(403);
    }
  });

  it("another team's user is 404; bad input is 400", async () => {
    await as(LEAD, PW);
    expect((await patch(await uid("viewer@birch.example"), { active: false })).status).toBe(404);
    expect((await patch(999999, { active: false })).status).toBe(404);
    expect((await patch(await uid(VIEWER), {})).status).toBe(400);
    expect((await patch(await uid(VIEWER), { role: "admin" })).body.issues[0].path).toBe("role");
    expect((await patch(await uid(VIEWER), undefined, "nope")).body.error).toBe("invalid_json");
  });

  it("a lead changes a role, deactivates (the member is signed out) and reactivates", async () => {
    const lockout = await uid("lockout@alder.example");
    await as(LEAD, PW);
    const r = await patch(lockout, { role: "analyst" });
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ role: "analyst", active: true });
    await as(VIEWER, PW);
    expect((await call(membersRoute.GET(req("GET", "/api/team/members"), {}))).status).toBe(200);
    await as(LEAD, PW);
    expect((await patch(await uid(VIEWER), { active: false })).body.active).toBe(false);
    useJar(VIEWER); // the viewer's existing session stops working
    expect((await call(membersRoute.GET(req("GET", "/api/team/members"), {}))).status).toBe(401);
    await as(LEAD, PW);
    expect((await patch(await uid(VIEWER), { active: true })).body.active).toBe(true);
    expect(await AuditEvent.count({ where: { action: "member.deactivate", target: `user:${await uid(VIEWER)}` } })).toBe(1);
    expect(await AuditEvent.count({ where: { action: "member.role", target: `user:${lockout}` } })).toBe(1);
    // The member is told of the new role by e-mail (deactivation and reactivation send nothing).
    const told = await MailMessage.findAll({ where: { to: "lockout@alder.example" } });
    expect(told.map((m) => m.subject)).toEqual(["Your role on Alder Flight Studio is now analyst"]);
  });

  it("the last active lead cannot demote or deactivate themselves (409); with a second lead they can", async () => {
    await as(BIRCH_LEAD, PW);
    const bea = await uid(BIRCH_LEAD);
    const ben = await uid("designer@birch.example");
    for (const body of [{ role: "designer" }, { active: false }]) {
      const r = await patch(bea, body);
      expect(r.status).toBe(409);
      expect(r.body.error).toBe("last_lead");
      expect(r.body.message).toMatch(/last active lead/);
    }
    expect((await patch(ben, { role: "lead" })).status).toBe(200);
    expect((await patch(bea, { role: "designer" })).status).toBe(200);
    await as("designer@birch.example", PW); // Ben is now the only lead
    expect((await patch(ben, { active: false })).status).toBe(409);
    expect((await patch(bea, { role: "lead" })).status).toBe(200); // Bea leads again for the tests below
  });
});

describe("invitations", () => {
  const tokenFrom = (text: string) => /\/invite\/([A-Za-z0-9_-]{43})/.exec(text)?.[1] ?? "";
  const getInv = (token: string) => call(acceptRoute.GET(req("GET", `/api/invitations/${token}`), ctx({ token })));
  const accept = (token: string, body: unknown, raw?: string) => call(acceptRoute.POST(req("POST", `/api/invitations/${token}`, body, raw), ctx({ token })));
  const invite = (body: unknown, raw?: string) => call(invitationsRoute.POST(req("POST", "/api/team/invitations", body, raw), {}));

  it("only a lead may list or create invitations", async () => {
    anonymous();
    expect((await call(invitationsRoute.GET(req("GET", "/api/team/invitations"), {}))).status).toBe(401);
    for (const who of [DESIGNER, ANALYST, VIEWER]) {
      await as(who, PW);
      expect((await call(invitationsRoute.GET(req("GET", "/api/team/invitations"), {}))).status).toBe(403);
      expect((await invite({ email: "x@alder.example", role: "viewer" })).status).toBe(403);
    }
  });

  it("rejects bad input (400) and an address that already has an account (409)", async () => {
    await as(LEAD, PW);
    expect((await invite(undefined, "{")).body.error).toBe("invalid_json");
    expect((await invite({ email: "not-an-email", role: "viewer" })).body.issues[0].path).toBe("email");
    expect((await invite({ email: "new@alder.example", role: "boss" })).body.issues[0].path).toBe("role");
    const taken = await invite({ email: "Designer@Alder.example", role: "viewer" });
    expect(taken.status).toBe(409);
    expect(taken.body.error).toBe("email_taken");
    expect((await invite({ email: "viewer@birch.example", role: "viewer" })).status).toBe(409);
  });

  it("end to end: invite, open the e-mailed link, set a password, signed in as the new member", async () => {
    await as(LEAD, PW);
    const r = await invite({ email: "Nadia@Alder.example", role: "analyst" });
    expect(r.status).toBe(201);
    expect(r.body.invitation).toMatchObject({ email: "nadia@alder.example", role: "analyst", state: "pending", invitedByName: "Ana Lead" });
    const mail = (await mailTo("nadia@alder.example")).at(-1)!;
    expect(mail.subject).toMatch(/invited you to Alder Flight Studio/);
    const token = tokenFrom(mail.text);
    expect(token).toHaveLength(43);
    const stored = await Invitation.findOne({ where: { email: "nadia@alder.example" } });
    expect(stored!.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored!.tokenHash).not.toContain(token);
    expect(stored!.expiresAt.getTime() - Date.now()).toBeGreaterThan(6.9 * 86400_000);

    const list = await call(invitationsRoute.GET(req("GET", "/api/team/invitations"), {}));
    expect(list.body.items.map((i: { email: string }) => i.email)).toContain("nadia@alder.example");

    useJar("nadia");
    const pub = await getInv(token);
    expect(pub.status).toBe(200);
    expect(pub.body).toMatchObject({ teamName: "Alder Flight Studio", email: "nadia@alder.example", role: "analyst" });
    expect((await accept(token, { name: "Nadia", password: "short" })).body.issues[0].path).toBe("password");
    expect((await accept(token, { name: "", password: "long-enough-password" })).body.issues[0].path).toBe("name");
    expect((await accept(token, undefined, "{")).body.error).toBe("invalid_json");
    expect((await call(membersRoute.GET(req("GET", "/api/team/members"), {}))).status).toBe(401);

    const ok = await accept(token, { name: "Nadia Brandt", password: "long-enough-password" });
    expect(ok.status).toBe(201);
    expect(ok.body.user).toMatchObject({ name: "Nadia Brandt", email: "nadia@alder.example", role: "analyst", teamName: "Alder Flight Studio" });
    const members = await call(membersRoute.GET(req("GET", "/api/team/members"), {})); // the session cookie is set
    expect(members.status).toBe(200);
    expect(members.body.items.map((m: { email: string }) => m.email)).toContain("nadia@alder.example");
    await as("nadia@alder.example", "long-enough-password"); // and the password works for sign-in
    expect(await AuditEvent.count({ where: { action: "invitation.accept" } })).toBe(1);

    useJar("nadia-again");
    const used = await accept(token, { name: "Again", password: "long-enough-password" });
    expect(used.status).toBe(404);
    expect(used.body.error).toBe("invitation_used");
    expect((await getInv(token)).body.error).toBe("invitation_used");
  });

  it("unknown, expired, replaced and revoked links answer 404", async () => {
    useJar("stranger");
    expect((await getInv("garbage")).status).toBe(404);
    expect((await getInv("A".repeat(43))).body.error).toBe("not_found");

    await as(LEAD, PW);
    await invite({ email: "omar@alder.example", role: "viewer" });
    const first = tokenFrom((await mailTo("omar@alder.example")).at(-1)!.text);
    await invite({ email: "omar@alder.example", role: "designer" });
    const second = tokenFrom((await mailTo("omar@alder.example")).at(-1)!.text);
    expect(first).not.toBe(second);
    expect((await getInv(first)).body.error).toBe("invitation_expired");
    expect((await getInv(second)).body.role).toBe("designer");

    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { email: "omar@alder.example" } });
    const expired = await accept(second, { name: "Omar", password: "long-enough-password" });
    expect(expired.status).toBe(404);
    expect(expired.body.error).toBe("invitation_expired");
    expect(await User.count({ where: { email: "omar@alder.example" } })).toBe(0);

    await invite({ email: "rosa@alder.example", role: "viewer" });
    const rosa = await Invitation.findOne({ where: { email: "rosa@alder.example" } });
    const revoke = (id: number) => call(invitationRoute.DELETE(req("DELETE", `/api/team/invitations/${id}`), ctx({ invitationId: String(id) })));
    await as(BIRCH_LEAD, PW);
    expect((await revoke(rosa!.id)).status).toBe(404);
    await as(DESIGNER, PW);
    expect((await revoke(rosa!.id)).status).toBe(403);
    await as(LEAD, PW);
    expect((await revoke(rosa!.id)).status).toBe(200);
    expect((await revoke(rosa!.id)).status).toBe(409);
    expect((await getInv(tokenFrom((await mailTo("rosa@alder.example")).at(-1)!.text))).status).toBe(404);
  });
});

describe("audit trail", () => {
  it("is for leads only and lists who did what", async () => {
    anonymous();
    expect((await call(auditRoute.GET(req("GET", "/api/audit"), {}))).status).toBe(401);
    await as(DESIGNER, PW);
    expect((await call(auditRoute.GET(req("GET", "/api/audit"), {}))).status).toBe(403);
    await as(LEAD, PW);
    expect((await call(auditRoute.GET(req("GET", "/api/audit?limit=abc"), {}))).status).toBe(400);
    const r = await call(auditRoute.GET(req("GET", "/api/audit"), {}));
    expect(r.status).toBe(200);
    const actions = r.body.items.map((a: { action: string }) => a.action);
    for (const a of ["tour.review.submit", "tour.review.return", "tour.review.baseline", "invitation.create", "invitation.accept", "member.deactivate", "comment.create"]) {
      expect(actions).toContain(a);
    }
    expect(r.body.items.find((a: { action: string }) => a.action === "tour.review.return").actorName).toBe("Ana Lead");
    // Birch's events are not in Alder's trail.
    await as(BIRCH_LEAD, PW);
    const birch = await call(auditRoute.GET(req("GET", "/api/audit"), {}));
    expect(birch.body.items.map((a: { action: string }) => a.action)).not.toContain("invitation.create");
  });
});
