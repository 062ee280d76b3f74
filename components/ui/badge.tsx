import type { ReactNode } from "react";
import { cn } from "./cn";

export type BadgeTone = "neutral" | "accent" | "info" | "ok" | "warn" | "bad";

const tones: Record<BadgeTone, string> = {
  neutral: "border-line-strong bg-raised text-muted",
  accent: "border-accent/40 bg-accent-soft text-accent",
  info: "border-info/40 bg-info-soft text-info",
  ok: "border-ok/40 bg-ok-soft text-ok",
  warn: "border-warn/45 bg-warn-soft text-warn",
  bad: "border-bad/45 bg-bad-soft text-bad",
};

export interface BadgeProps {
  tone?: BadgeTone;
  icon?: ReactNode;
  className?: string;
  title?: string;
  children: ReactNode;
}

/** A small pill with optional icon. Always carries text: colour is never the only signal. */
export function Badge({ tone = "neutral", icon, className, title, children }: BadgeProps) {
  return (
    <span
      title={title}
      className={cn(
        "inline-flex h-6 items-center gap-1.5 rounded-full border px-2 text-xs font-medium whitespace-nowrap",
        tones[tone],
        className,
      )}
    >
      {icon}
      {children}
    </span>
  );
}

function Icon({ children }: { children: ReactNode }) {
  return (
    <svg viewBox="0 0 12 12" width="12" height="12" fill="none" aria-hidden className="shrink-0">
      {children}
    </svg>
  );
}

/* ---------- tour status ---------- */

export type TourStatus = "draft" | "in_review" | "returned" | "baselined";

export const TOUR_STATUS_LABEL: Record<TourStatus, string> = {
  draft: "Draft",
  in_review: "In review",
  returned: "Returned",
  baselined: "Baselined",
};

const statusTone: Record<TourStatus, BadgeTone> = {
  draft: "neutral",
  in_review: "info",
  returned: "warn",
  baselined: "ok",
};

function StatusIcon({ status }: { status: TourStatus }) {
  switch (status) {
    case "draft": // an open, dashed orbit: not yet closed
      return (
        <Icon>
          <circle cx="6" cy="6" r="4.4" stroke="currentColor" strokeWidth="1.3" strokeDasharray="2 1.6" />
        </Icon>
      );
    case "in_review": // a half-filled disc: waiting on someone
      return (
        <Icon>
          <circle cx="6" cy="6" r="4.4" stroke="currentColor" strokeWidth="1.3" />
          <path d="M6 1.6a4.4 4.4 0 0 1 0 8.8z" fill="currentColor" />
        </Icon>
      );
    case "returned": // an arrow bending back
      return (
        <Icon>
          <path
            d="M4.6 2.6 2 5.1l2.6 2.5M2.3 5.1h5a2.8 2.8 0 0 1 0 5.6H5.8"
            stroke="currentColor"
            strokeWidth="1.35"
            strokeLinecap="round"
            strokeLinejoin="round"
          />
        </Icon>
      );
    case "baselined": // a padlock: read-only from here on
      return (
        <Icon>
          <rect x="2.3" y="5.2" width="7.4" height="5.3" rx="1.1" fill="currentColor" />
          <path d="M3.9 5.2V3.9a2.1 2.1 0 0 1 4.2 0v1.3" stroke="currentColor" strokeWidth="1.3" />
        </Icon>
      );
  }
}

export interface StatusBadgeProps {
  status: TourStatus;
  className?: string;
}

/** Review status of a tour: text plus a distinct icon per status. */
export function StatusBadge({ status, className }: StatusBadgeProps) {
  return (
    <Badge tone={statusTone[status]} icon={<StatusIcon status={status} />} className={className}>
      <span data-status={status}>{TOUR_STATUS_LABEL[status]}</span>
    </Badge>
  );
}

/* ---------- constraint flags ---------- */

export type FlagLevel = "ok" | "margin" | "violated";

export const FLAG_LABEL: Record<FlagLevel, string> = {
  ok: "OK",
  margin: "Margin",
  violated: "Violated",
};

const flagTone: Record<FlagLevel, BadgeTone> = { ok: "ok", margin: "warn", violated: "bad" };

function FlagIcon({ level }: { level: FlagLevel }) {
  switch (level) {
    case "ok":
      return (
        <Icon>
          <circle cx="6" cy="6" r="4.7" stroke="currentColor" strokeWidth="1.2" />
          <path d="m3.8 6.1 1.5 1.5 2.9-3" stroke="currentColor" strokeWidth="1.35" strokeLinecap="round" strokeLinejoin="round" />
        </Icon>
      );
    case "margin":
      return (
        <Icon>
          <path d="M6 1.5 10.8 10H1.2z" stroke="currentColor" strokeWidth="1.2" strokeLinejoin="round" />
          <path d="M6 4.8v2.4" stroke="currentColor" strokeWidth="1.3" strokeLinecap="round" />
          <circle cx="6" cy="8.6" r="0.7" fill="currentColor" />
        </Icon>
      );
    case "violated":
      return (
        <Icon>
          <path d="M4 1.3h4L10.7 4v4L8 10.7H4L1.3 8V4z" fill="currentColor" />
          <path d="m4.4 4.4 3.2 3.2m0-3.2L4.4 7.6" stroke="var(--gy-surface)" strokeWidth="1.3" strokeLinecap="round" />
        </Icon>
      );
  }
}

export interface FlagBadgeProps {
  level: FlagLevel;
  /** Text shown instead of the default ("OK", "Margin", "Violated"), e.g. "C3 14.2 ≤ 15". */
  children?: ReactNode;
  title?: string;
  className?: string;
}

/** A constraint flag: ok / margin (near the limit) / violated, with text and icon. */
export function FlagBadge({ level, children, title, className }: FlagBadgeProps) {
  return (
    <Badge tone={flagTone[level]} icon={<FlagIcon level={level} />} title={title} className={className}>
      <span data-flag={level}>{children ?? FLAG_LABEL[level]}</span>
    </Badge>
  );
}

/* ---------- roles ---------- */

export type Role = "lead" | "designer" | "analyst" | "viewer";

export const ROLE_LABEL: Record<Role, string> = {
  lead: "Team lead",
  designer: "Trajectory designer",
  analyst: "Navigation analyst",
  viewer: "Viewer",
};

/** A neutral text badge for a user's role. */
export function RoleBadge({ role, className }: { role: Role; className?: string }) {
  return (
    <Badge tone={role === "lead" ? "accent" : "neutral"} className={className}>
      {role}
    </Badge>
  );
}
