import type { TourDiff } from "@/lib/tours/diff";
import { Num, formatNum } from "@/components/ui/num";
import { bodyLabel, dateOf } from "@/lib/format";
import { cn } from "@/components/ui/cn";

export interface DiffViewProps {
  diff: TourDiff;
  fromVersion: number;
  toVersion: number;
  className?: string;
}

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <div>
      <h4 className="mb-1.5 text-xs font-semibold uppercase tracking-wide text-muted">{title}</h4>
      <ul className="space-y-1 text-sm text-ink">{children}</ul>
    </div>
  );
}

function Mark({ kind }: { kind: "added" | "removed" | "changed" | "moved" }) {
  const text = { added: "+ added", removed: "− removed", changed: "~ changed", moved: "↕ moved" }[kind];
  const tone = { added: "text-ok", removed: "text-bad", changed: "text-info", moved: "text-info" }[kind];
  return <span className={cn("num mr-2 inline-block w-20 text-xs", tone)}>{text}</span>;
}

const legText = (o?: { revs: number; branch: string | null; prograde: boolean }) =>
  o ? `${o.revs} rev${o.revs === 1 ? "" : "s"}${o.branch ? ` (${o.branch})` : ""}, ${o.prograde ? "prograde" : "retrograde"}` : "—";

/** Metric values: dates for launch/arrival (TDB s), numbers with units otherwise. */
function MetricValue({ k, value, unit }: { k: string; value: number | null; unit: string }) {
  if (k === "launch" || k === "arrival") return <span className="num">{dateOf(value)}</span>;
  return <Num value={value} unit={unit || undefined} digits={k === "violations" ? 0 : k === "minMargin" ? 0 : k === "tof" ? 1 : 3} />;
}

/** What changed from one revision to another (the output of lib/tours/diff.ts). */
export function DiffView({ diff, fromVersion, toVersion, className }: DiffViewProps) {
  const n = diff.nodes;
  const changed = new Set(diff.changedMetrics);
  return (
    <div className={cn("space-y-5", className)} data-testid="revision-diff">
      <p className="text-sm text-muted">
        Changes from version <span className="num text-ink">{fromVersion}</span> to version <span className="num text-ink">{toVersion}</span>
        {diff.identical ? ": none — the two revisions hold the same tour." : "."}
      </p>

      <div className="overflow-x-auto rounded-md border border-line">
        <table className="w-full text-sm">
          <thead className="bg-raised text-left text-xs uppercase tracking-wide text-muted">
            <tr>
              <th className="px-3 py-2 font-medium">Key number</th>
              <th className="px-3 py-2 text-right font-medium">v{fromVersion}</th>
              <th className="px-3 py-2 text-right font-medium">v{toVersion}</th>
              <th className="px-3 py-2 text-right font-medium">Change</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-line">
            {diff.metrics.map((m) => (
              <tr key={m.key} className={changed.has(m.key) ? "bg-accent-soft/40" : undefined}>
                <td className="px-3 py-1.5 text-ink">
                  {m.label}
                  {changed.has(m.key) ? <span className="ml-2 text-xs text-accent">changed</span> : null}
                </td>
                <td className="px-3 py-1.5 text-right"><MetricValue k={m.key} value={m.from} unit={m.unit} /></td>
                <td className="px-3 py-1.5 text-right"><MetricValue k={m.key} value={m.to} unit={m.unit} /></td>
                <td className="px-3 py-1.5 text-right">
                  {m.delta === null || !changed.has(m.key) ? (
                    <span className="text-faint">—</span>
                  ) : m.key === "launch" || m.key === "arrival" ? (
                    <Num value={m.delta / 86400} unit="d" digits={1} signed />
                  ) : (
                    <Num value={m.delta} unit={m.unit || undefined} digits={m.key === "violations" || m.key === "minMargin" ? 0 : m.key === "tof" ? 1 : 3} signed />
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>

      <div className="grid gap-5 md:grid-cols-2">
        {diff.name || diff.status || diff.ephemeris || diff.arrival ? (
          <Section title="Tour">
            {diff.name ? <li><Mark kind="changed" />Name: {diff.name.from} → {diff.name.to}</li> : null}
            {diff.status ? <li><Mark kind="changed" />Status: {diff.status.from.replace("_", " ")} → {diff.status.to.replace("_", " ")}</li> : null}
            {diff.ephemeris ? <li><Mark kind="changed" />Ephemeris: {diff.ephemeris.from} → {diff.ephemeris.to}</li> : null}
            {diff.arrival ? <li><Mark kind="changed" />Arrival: {diff.arrival.from} → {diff.arrival.to}</li> : null}
          </Section>
        ) : null}

        {n.added.length + n.removed.length + n.moved.length + n.bodyChanged.length + n.epochs.length + n.windows.length > 0 ? (
          <Section title="Chain">
            {n.added.map((x) => <li key={`a${x.id}`}><Mark kind="added" />{bodyLabel(x.body)} <span className="text-faint">({x.id})</span> at position {x.index + 1}</li>)}
            {n.removed.map((x) => <li key={`r${x.id}`}><Mark kind="removed" />{bodyLabel(x.body)} <span className="text-faint">({x.id})</span> from position {x.index + 1}</li>)}
            {n.moved.map((x) => <li key={`m${x.id}`}><Mark kind="moved" />{bodyLabel(x.body)} <span className="text-faint">({x.id})</span> position {x.fromIndex + 1} → {x.toIndex + 1}</li>)}
            {n.bodyChanged.map((x) => <li key={`b${x.id}`}><Mark kind="changed" />Node {x.id}: {bodyLabel(x.from)} → {bodyLabel(x.to)}</li>)}
            {n.epochs.map((x) => (
              <li key={`e${x.id}`}>
                <Mark kind="changed" />{bodyLabel(x.body)} <span className="text-faint">({x.id})</span> epoch <span className="num">{dateOf(x.from)}</span> → <span className="num">{dateOf(x.to)}</span>{" "}
                (<Num value={x.deltaDays} unit="d" digits={2} signed />)
              </li>
            ))}
            {n.windows.map((x) => <li key={`w${x.id}`}><Mark kind="changed" />Search window of {x.id}: {x.from ? `${dateOf(x.from.start)}…${dateOf(x.from.end)}` : "none"} → {x.to ? `${dateOf(x.to.start)}…${dateOf(x.to.end)}` : "none"}</li>)}
          </Section>
        ) : null}

        {diff.legs.length > 0 ? (
          <Section title="Legs">
            {diff.legs.map((l) => (
              <li key={`${l.change}${l.key}`}>
                <Mark kind={l.change} />
                {l.fromNode} → {l.toNode}: {l.change === "changed" ? `${legText(l.from)} → ${legText(l.to)}` : legText(l.to ?? l.from)}
              </li>
            ))}
          </Section>
        ) : null}

        {diff.aim.length + diff.rpMin.length > 0 ? (
          <Section title="Aim points and flyby options">
            {diff.aim.map((a) => (
              <li key={`aim${a.nodeId}`}>
                <Mark kind={a.change} />Aim at {a.nodeId}
                {a.to ? <>: B·T <Num value={a.to.bT} unit="km" digits={0} />, B·R <Num value={a.to.bR} unit="km" digits={0} /></> : null}
                {a.change === "changed" && a.from ? <span className="text-faint"> (was B·T {formatNum(a.from.bT, 0)} km, B·R {formatNum(a.from.bR, 0)} km)</span> : null}
              </li>
            ))}
            {diff.rpMin.map((r) => (
              <li key={`rp${r.body}`}>
                <Mark kind={r.from === null ? "added" : r.to === null ? "removed" : "changed"} />Minimum periapsis at {bodyLabel(r.body)}: {r.from === null ? "default" : <Num value={r.from} unit="km" digits={0} />} → {r.to === null ? "default" : <Num value={r.to} unit="km" digits={0} />}
              </li>
            ))}
          </Section>
        ) : null}
      </div>
    </div>
  );
}
