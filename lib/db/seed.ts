/**
 * Demo and end-to-end data. Everything here is an invented scenario: an invented team, people,
 * probes and small bodies; no real mission's data. No `server-only`: scripts import this.
 */
import { sequelize } from "./sequelize";
import { sendMail } from "@/lib/mail/mailer";
import { CustomBody, Team, Tour, TourRevision, User, AuditEvent, Comment } from "@/models";
import type { Role } from "@/lib/auth/roles";
import { hashPassword } from "@/lib/auth/password";
import { isoToTdbSeconds } from "@/lib/astro/time";
import { AU_KM } from "@/lib/astro/constants";
import { evaluateStoredTour, type TeamBody } from "@/lib/tours/evaluate";
import { toTeamBody } from "./queries/bodies";
import type { StoredTour } from "@/lib/validation/tour";

const DAY = 86400;
const deg = Math.PI / 180;

export interface SeedUser {
  email: string;
  name: string;
  role: Role;
  password: string;
}

/** Demo sign-ins (documented in the README). */
export const DEMO_USERS: SeedUser[] = [
  { email: "lead@meridian.example", name: "Ines Okafor", role: "lead", password: "gybe-demo-lead" },
  { email: "designer@meridian.example", name: "Tomas Lindqvist", role: "designer", password: "gybe-demo-designer" },
  { email: "analyst@meridian.example", name: "Priya Raman", role: "analyst", password: "gybe-demo-analyst" },
  { email: "viewer@meridian.example", name: "Jun Park", role: "viewer", password: "gybe-demo-viewer" },
];

/** Invented small bodies (osculating heliocentric ecliptic J2000 elements). */
export const DEMO_BODIES = [
  { slug: "aldra", name: "Aldra (invented)", epochIso: "2030-01-01T00:00:00Z", aAu: 2.31, e: 0.19, iDeg: 6.2, raanDeg: 121.4, argpDeg: 42.9, nuDeg: 15.0, mu: 1.1, radius: 9.5, minAlt: 50 },
  { slug: "corvin", name: "Corvin (invented)", epochIso: "2030-01-01T00:00:00Z", aAu: 1.48, e: 0.31, iDeg: 3.9, raanDeg: 301.7, argpDeg: 188.2, nuDeg: 250.0, mu: 0.05, radius: 2.1, minAlt: 20 },
  { slug: "tessaly", name: "Tessaly (invented)", epochIso: "2030-01-01T00:00:00Z", aAu: 3.05, e: 0.08, iDeg: 11.3, raanDeg: 64.0, argpDeg: 270.5, nuDeg: 120.0, mu: 4.2, radius: 24, minAlt: 100 },
];

function t(iso: string): number {
  return isoToTdbSeconds(iso);
}

function win(epoch: number, halfDays: number) {
  return { start: epoch - halfDays * DAY, end: epoch + halfDays * DAY };
}

/** Build a stored tour from ISO node dates. */
export function tourOf(
  nodes: { id: string; body: string; iso: string; half?: number }[],
  extra: Partial<Pick<StoredTour, "legs" | "arrival" | "rpMin" | "aim">> & { ephemeris?: "vsop" | "mean" } = {},
): StoredTour {
  return {
    formatVersion: 1,
    ephemeris: { kind: extra.ephemeris ?? "vsop", cached: true },
    nodes: nodes.map((n) => {
      const epoch = t(n.iso);
      return { id: n.id, body: n.body as StoredTour["nodes"][number]["body"], epoch, window: win(epoch, n.half ?? 30) };
    }),
    legs: extra.legs ?? nodes.slice(1).map(() => ({ revs: 0, prograde: true })),
    arrival: extra.arrival ?? { kind: "flyby" },
    rpMin: extra.rpMin ?? {},
    aim: extra.aim ?? {},
  };
}

/** The demo tours of the invented team (names of invented probes). */
export function demoTours(): { name: string; owner: Role; status: Tour["status"]; tour: StoredTour }[] {
  return [
    {
      name: "Wren — Mars rendezvous, 2028 window",
      owner: "designer",
      status: "baselined",
      tour: tourOf(
        [
          { id: "launch", body: "earth", iso: "2028-11-24T05:11:00Z", half: 45 },
          { id: "mars", body: "mars", iso: "2029-09-22T00:10:00Z", half: 60 },
        ],
        { arrival: { kind: "capture", rp: 3396.19 + 400, e: 0.9 } },
      ),
    },
    {
      name: "Kestrel — Jupiter via Venus and Earth",
      owner: "designer",
      status: "in_review",
      tour: tourOf(
        [
          { id: "launch", body: "earth", iso: "2031-05-01T19:33:41Z" },
          { id: "venus", body: "venus", iso: "2031-10-12T12:47:45Z" },
          { id: "earth1", body: "earth", iso: "2032-07-15T11:40:07Z" },
          { id: "earth2", body: "earth", iso: "2034-07-15T23:49:21Z" },
          { id: "jupiter", body: "jupiter", iso: "2038-05-13T20:39:19Z", half: 120 },
        ],
        { arrival: { kind: "capture", rp: 71492 * 10, e: 0.95 } },
      ),
    },
    {
      name: "Petrel — Saturn tour study",
      owner: "lead",
      status: "draft",
      tour: tourOf(
        [
          { id: "launch", body: "earth", iso: "2029-10-15T15:30:49Z" },
          { id: "venus", body: "venus", iso: "2030-03-17T16:22:46Z" },
          { id: "earth", body: "earth", iso: "2032-02-06T04:24:26Z" },
          { id: "jupiter", body: "jupiter", iso: "2034-11-02T00:41:44Z" },
          { id: "saturn", body: "saturn", iso: "2040-12-08T00:53:21Z", half: 200 },
        ],
        { arrival: { kind: "flyby" } },
      ),
    },
    {
      name: "Skua — Aldra flyby via Mars",
      owner: "designer",
      status: "returned",
      tour: tourOf(
        [
          { id: "launch", body: "earth", iso: "2033-07-21T18:34:00Z" },
          { id: "mars", body: "mars", iso: "2034-09-28T06:21:00Z" },
          { id: "aldra", body: "custom:aldra", iso: "2036-07-24T10:55:00Z" },
        ],
        { arrival: { kind: "flyby" } },
      ),
    },
  ];
}

export interface SeedTeamOptions {
  teamName: string;
  users: SeedUser[];
  bodies?: typeof DEMO_BODIES;
  tours?: ReturnType<typeof demoTours>;
  mail?: boolean;
}

/** Seed one team with its users, bodies and tours. Returns the team id and user ids by role. */
export async function seedTeam(opts: SeedTeamOptions): Promise<{ teamId: number; userIds: Record<string, number> }> {
  const result = await sequelize.transaction(async (transaction) => {
    const team = await Team.create({ name: opts.teamName }, { transaction });
    const userIds: Record<string, number> = {};
    for (const u of opts.users) {
      const row = await User.create(
        { teamId: team.id, email: u.email.toLowerCase(), name: u.name, role: u.role, passwordHash: await hashPassword(u.password) },
        { transaction },
      );
      userIds[u.email] = row.id;
      if (!userIds[u.role]) userIds[u.role] = row.id;
    }
    const bodies: TeamBody[] = [];
    for (const b of opts.bodies ?? []) {
      const row = await CustomBody.create(
        {
          teamId: team.id,
          slug: b.slug,
          name: b.name,
          epochTdbS: t(b.epochIso),
          aKm: b.aAu * AU_KM,
          e: b.e,
          iRad: b.iDeg * deg,
          raanRad: b.raanDeg * deg,
          argpRad: b.argpDeg * deg,
          nuRad: b.nuDeg * deg,
          muKm3S2: b.mu,
          radiusKm: b.radius,
          minAltKm: b.minAlt,
        },
        { transaction },
      );
      bodies.push(toTeamBody(row));
    }
    for (const spec of opts.tours ?? []) {
      const { summary } = evaluateStoredTour(spec.tour, bodies);
      const ownerId = userIds[spec.owner] ?? Object.values(userIds)[0]!;
      const tour = await Tour.create(
        {
          teamId: team.id,
          ownerId,
          name: spec.name,
          status: spec.status,
          version: 1,
          specJson: JSON.stringify(spec.tour),
          ephemeris: spec.tour.ephemeris.kind,
          chain: spec.tour.nodes.map((n) => n.body).join(","),
          ...summary,
        },
        { transaction },
      );
      await TourRevision.create(
        { tourId: tour.id, version: 1, specJson: tour.specJson, summaryJson: JSON.stringify({ name: tour.name, status: tour.status, ...summary }), authorId: ownerId, note: "created (demo data)" },
        { transaction },
      );
      await AuditEvent.create({ teamId: team.id, actorId: ownerId, action: "tour.create", target: `tour:${tour.id}`, detail: JSON.stringify({ name: tour.name }) }, { transaction });
      if (spec.status === "returned") {
        const lead = userIds.lead ?? ownerId;
        await Comment.create({ tourId: tour.id, authorId: lead, body: "Returned: the Mars flyby date needs a second look against the launch-period plan.", nodeId: null }, { transaction });
      }
    }
    return { teamId: team.id, userIds };
  });
  if (opts.mail) {
    // Sent through the mailer (locally: stored for Outbox), like every other message.
    const lead = opts.users.find((u) => u.role === "lead");
    await sendMail({
      teamId: result.teamId,
      to: opts.users.map((u) => u.email),
      subject: `Welcome to Gybe, ${opts.teamName}`,
      text: `Hello team,\n\nOur workspace is ready. Tours live under Tours; the Workbench replays them.\nRemember: results are preliminary patched-conic design, to be verified with high-fidelity navigation software and our flight-dynamics authority.\n\n— ${lead?.name ?? "Gybe"}`,
    });
  }
  return result;
}

/** Seed the demo team when the database has no team yet. Returns false when it was not empty. */
export async function seedDemoIfEmpty(): Promise<boolean> {
  if ((await Team.count()) > 0) return false;
  await seedTeam({ teamName: "Meridian Trajectory Lab", users: DEMO_USERS, bodies: DEMO_BODIES, tours: demoTours(), mail: true });
  return true;
}

/** End-to-end data: two teams, one user per role each, and a user kept for the lock-out test. */
export const E2E_PASSWORD = "e2e-password-123";
export async function seedE2E(): Promise<void> {
  const usersOf = (domain: string, names: string[]): SeedUser[] =>
    (["lead", "designer", "analyst", "viewer"] as Role[]).map((role, i) => ({
      email: `${role}@${domain}`,
      name: names[i]!,
      role,
      password: E2E_PASSWORD,
    }));
  await seedTeam({
    teamName: "Alder Flight Studio",
    users: [...usersOf("alder.example", ["Ana Lead", "Dev Designer", "Ari Analyst", "Vic Viewer"]), { email: "lockout@alder.example", name: "Lou Lockout", role: "viewer", password: E2E_PASSWORD }],
    bodies: DEMO_BODIES,
    tours: demoTours(),
    mail: true,
  });
  await seedTeam({
    teamName: "Birch Orbital",
    users: usersOf("birch.example", ["Bea Lead", "Ben Designer", "Bo Analyst", "Bru Viewer"]),
    tours: demoTours().slice(0, 1).map((x) => ({ ...x, name: "Birch private tour" })),
  });
}
