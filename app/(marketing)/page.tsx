import type { Metadata } from "next";
import Link from "next/link";
import { GybeMark, GybeWordmark } from "@/components/brand/gybe-mark";
import { TourSketch } from "@/components/marketing/tour-sketch";
import { LinkButton } from "@/components/ui/button";
import { CautionBanner } from "@/components/ui/caution-banner";

export const metadata: Metadata = {
  title: { absolute: "Gybe — gravity-assist tour design for teams" },
  description:
    "Find launch dates and flyby chains that reach the target with the least propellant and launch energy, aim every flyby in the B-plane, and baseline a tour as a team.",
};

const constraints = [
  { k: "C3", text: "launch energy the rocket can deliver" },
  { k: "rp", text: "flyby periapsis above atmospheres, rings and radiation limits" },
  { k: "v∞", text: "arrival speed the capture burn can absorb" },
  { k: "TOF", text: "total flight time the programme can afford" },
];

const roles = [
  {
    who: "Trajectory designer",
    role: "designer",
    does: "Chains the bodies — Earth → Venus → Earth → Jupiter — sets epoch windows, scans departure and arrival dates, runs a global tour search, adopts the best candidate and saves it.",
    icon: (
      <path d="M4 18c4-1 9-3 11-7s1-6-1-6-4 3-2 6 6 4 8 4" strokeLinecap="round" strokeLinejoin="round" />
    ),
  },
  {
    who: "Navigation analyst",
    role: "analyst",
    does: "Opens a flyby and drags its aim point on the B-plane: turn angle, periapsis altitude, where the outgoing leg goes and how far it misses the next body — against the impact circle, the minimum-altitude circle and a dispersion ellipse.",
    icon: (
      <>
        <circle cx="12" cy="12" r="8" />
        <circle cx="12" cy="12" r="4" strokeDasharray="2 2" />
        <path d="M12 2v4M12 18v4M2 12h4M18 12h4" strokeLinecap="round" />
      </>
    ),
  },
  {
    who: "Team lead",
    role: "lead",
    does: "Puts saved tours side by side — C3, Δv budget, flight time, arrival v∞, flyby margins — comments, returns a tour for rework or baselines it, and manages who is on the team.",
    icon: (
      <>
        <path d="M4 20V8M10 20V4M16 20v-8M22 20H2" strokeLinecap="round" />
      </>
    ),
  },
  {
    who: "Student intern",
    role: "viewer",
    does: "Replays a tour on the timeline in 3D, scrubs from launch to arrival and reads every number — without being able to change anything.",
    icon: (
      <>
        <circle cx="12" cy="12" r="9" />
        <path d="M10 8.5v7l5.5-3.5z" fill="currentColor" strokeLinejoin="round" />
      </>
    ),
  },
];

const screens = [
  { name: "Tours", text: "Every tour of the team in one sortable, filterable table, with its review status." },
  {
    name: "Workbench",
    text: "The Chain of bodies and epochs, the 3D Orrery with orbits, arcs and a moving spacecraft, the Encounter card of the selected flyby, the Timeline strip, the Δv budget and the constraint flags.",
  },
  {
    name: "Aim board",
    text: "One flyby's B-plane: a draggable aim point on B·T / B·R axes with live readouts of |B|, θ, rp, altitude, turn angle and the miss at the next body.",
  },
  { name: "Window scan", text: "A porkchop of departure × arrival dates with C3, v∞ and total-Δv contours. Click a cell to adopt it." },
  { name: "Tour search", text: "Optimises all epochs of the chain within bounds, shows progress, can be cancelled, ranks the candidates." },
  { name: "Compare", text: "Two to six tours side by side: metrics table, Δv bars and timelines on a common axis." },
  { name: "Catalog", text: "The planets from the ephemeris and the team's own small bodies, typed in or uploaded as orbital elements." },
  { name: "Team & Outbox", text: "Members, roles, invitations and the audit trail, plus every message the review flow has sent." },
];

const computes = [
  "Lambert arcs, single and multi-revolution",
  "Powered flybys and turn-angle limits",
  "B-plane targeting",
  "Window scans (porkchops)",
  "Seeded, reproducible global search",
  "CCSDS OEM export",
];

export default function LandingPage() {
  return (
    <div className="relative min-h-dvh overflow-x-hidden">
      <div
        aria-hidden
        className="pointer-events-none absolute inset-x-0 top-0 h-[640px] bg-[radial-gradient(ellipse_at_70%_0%,var(--gy-accent-soft),transparent_60%)]"
      />
      <header className="relative mx-auto flex max-w-6xl items-center justify-between px-6 py-5">
        <Link href="/" className="rounded-md" aria-label="Gybe home">
          <GybeWordmark />
        </Link>
        <nav aria-label="Landing" className="flex items-center gap-1 text-sm">
          <a href="#roles" className="hidden rounded-md px-3 py-2 text-muted hover:text-ink sm:block">
            Who it is for
          </a>
          <a href="#screens" className="hidden rounded-md px-3 py-2 text-muted hover:text-ink sm:block">
            Screens
          </a>
          <LinkButton href="/sign-in" variant="primary" size="sm" className="ml-2">
            Sign in
          </LinkButton>
        </nav>
      </header>

      <main className="relative">
        {/* hero */}
        <section className="mx-auto grid max-w-6xl items-center gap-10 px-6 pt-10 pb-16 lg:grid-cols-[1.05fr_1fr] lg:pt-16">
          <div>
            <p className="mb-5 inline-flex items-center gap-2 rounded-full border border-line bg-surface/70 py-1 pr-3 pl-1.5 text-xs text-muted">
              <GybeMark size={20} />
              Patched conics, in the browser, shared by the team
            </p>
            <h1 className="text-4xl leading-[1.08] font-semibold tracking-tight text-ink sm:text-5xl">
              Swing the spacecraft around planets, <span className="text-accent">not through spreadsheets.</span>
            </h1>
            <p className="mt-5 max-w-xl text-base leading-relaxed text-muted sm:text-lg">
              Gybe is a workbench for gravity-assist tours: a launch, a chain of flybys and an arrival. Find
              the launch dates and flyby chain that reach the target with the least propellant and launch
              energy, turn each flyby into a B-plane aim point, and let the team lead compare, review and
              baseline the result — all in one shared place.
            </p>
            <div className="mt-8 flex flex-wrap items-center gap-3">
              <LinkButton href="/tours" variant="primary" size="lg">
                Open your team&apos;s tours
              </LinkButton>
              <LinkButton href="#screens" variant="secondary" size="lg">
                Tour the screens
              </LinkButton>
            </div>
            <p className="mt-4 text-xs text-faint">Accounts are issued by your team lead.</p>
          </div>
          <div className="relative">
            <div className="rounded-2xl border border-line bg-surface/60 p-2 shadow-panel">
              <TourSketch className="h-auto w-full" />
              <dl className="grid grid-cols-3 gap-px overflow-hidden rounded-lg border border-line bg-line text-xs">
                {[
                  ["launch C3", "14.8", "km²/s²"],
                  ["total Δv", "0.412", "km/s"],
                  ["arrival v∞", "5.63", "km/s"],
                ].map(([k, v, u]) => (
                  <div key={k} className="bg-surface px-3 py-2">
                    <dt className="text-faint">{k}</dt>
                    <dd className="num mt-0.5 text-sm text-ink">
                      {v} <span className="text-xs text-muted">{u}</span>
                    </dd>
                  </div>
                ))}
              </dl>
            </div>
            <p className="mt-2 text-center text-xs text-faint">An invented E–V–E–J example tour.</p>
          </div>
        </section>

        {/* the job */}
        <section className="border-y border-line bg-surface/50">
          <div className="mx-auto grid max-w-6xl gap-10 px-6 py-14 lg:grid-cols-[1fr_1.2fr]">
            <div>
              <h2 className="text-2xl font-semibold tracking-tight text-ink">The job</h2>
              <p className="mt-3 leading-relaxed text-muted">
                Mission-analysis teams at agencies, universities and small-spacecraft companies look for the
                cheapest way to a target inside hard limits. Navigation then aims each flyby, and the lead
                has to pick a baseline and hand it on. Today that lives in scripts, spreadsheets and desktop
                suites that don&apos;t share results. Gybe computes in the browser and keeps every tour, review
                and revision in the team&apos;s own database.
              </p>
              <ul className="mt-6 flex flex-wrap gap-2">
                {computes.map((c) => (
                  <li key={c} className="rounded-md border border-line bg-canvas px-2.5 py-1 text-xs text-muted">
                    {c}
                  </li>
                ))}
              </ul>
            </div>
            <div>
              <h3 className="text-sm font-medium text-muted">Every tour is judged against</h3>
              <ul className="mt-3 grid gap-3 sm:grid-cols-2">
                {constraints.map((c) => (
                  <li key={c.k} className="rounded-panel border border-line bg-surface p-4">
                    <span className="num text-lg text-accent">{c.k}</span>
                    <p className="mt-1 text-sm text-ink">{c.text}</p>
                  </li>
                ))}
              </ul>
            </div>
          </div>
        </section>

        {/* roles */}
        <section id="roles" className="mx-auto max-w-6xl scroll-mt-8 px-6 py-16">
          <h2 className="text-2xl font-semibold tracking-tight text-ink">Who uses it</h2>
          <p className="mt-2 max-w-2xl text-muted">
            Four roles, one team database. Every action is checked on the server; the screens only offer what
            your role may do.
          </p>
          <ul className="mt-8 grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
            {roles.map((r) => (
              <li key={r.role} className="flex flex-col rounded-panel border border-line bg-surface p-5 shadow-panel">
                <svg
                  viewBox="0 0 24 24"
                  width="28"
                  height="28"
                  fill="none"
                  stroke="currentColor"
                  strokeWidth="1.5"
                  className="text-accent"
                  aria-hidden
                >
                  {r.icon}
                </svg>
                <h3 className="mt-4 font-semibold text-ink">{r.who}</h3>
                <p className="num mt-0.5 text-xs text-faint">role: {r.role}</p>
                <p className="mt-3 text-sm leading-relaxed text-muted">{r.does}</p>
              </li>
            ))}
          </ul>
        </section>

        {/* screens */}
        <section id="screens" className="border-t border-line bg-surface/50">
          <div className="mx-auto max-w-6xl scroll-mt-8 px-6 py-16">
            <h2 className="text-2xl font-semibold tracking-tight text-ink">The screens</h2>
            <p className="mt-2 max-w-2xl text-muted">
              From a blank chain of bodies to a baselined tour with aim points, without leaving the browser.
            </p>
            <dl className="mt-8 grid gap-x-8 gap-y-6 sm:grid-cols-2 lg:grid-cols-4">
              {screens.map((s, i) => (
                <div key={s.name} className="border-t border-line-strong pt-4">
                  <dt className="flex items-baseline gap-2 font-semibold text-ink">
                    <span className="num text-xs text-faint">{String(i + 1).padStart(2, "0")}</span>
                    {s.name}
                  </dt>
                  <dd className="mt-2 text-sm leading-relaxed text-muted">{s.text}</dd>
                </div>
              ))}
            </dl>
          </div>
        </section>

        <section className="mx-auto max-w-6xl px-6 py-12">
          <CautionBanner className="text-sm" />
        </section>
      </main>

      <footer className="border-t border-line">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-4 px-6 py-6 text-xs text-faint">
          <span className="inline-flex items-center gap-2">
            <GybeMark size={18} />
            Gybe — a gybe swings a boat&apos;s stern through the wind; a flyby swings a spacecraft&apos;s velocity
            around a planet.
          </span>
          <span>Patched-conic preliminary design</span>
        </div>
      </footer>
    </div>
  );
}
