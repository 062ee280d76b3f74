/**
 * The review flow of DESIGN.md as data: which action moves a tour from which status to which,
 * who may do it and whether a comment is required. Pure (the client panel and the server share it).
 */
import type { Action } from "@/lib/auth/roles";

export type TourStatus = "draft" | "in_review" | "returned" | "baselined";
export type ReviewAction = "submit" | "baseline" | "return" | "reopen";

export interface Transition {
  action: ReviewAction;
  from: readonly TourStatus[];
  to: TourStatus;
  /** The role-table action that allows it. */
  permission: Action;
  commentRequired: boolean;
  /** Button text. */
  label: string;
  /** Past tense, for notes, e-mails and the audit trail. */
  past: string;
}

export const TRANSITIONS: Record<ReviewAction, Transition> = {
  submit: { action: "submit", from: ["draft", "returned"], to: "in_review", permission: "review:submit", commentRequired: false, label: "Submit for review", past: "submitted for review" },
  baseline: { action: "baseline", from: ["in_review"], to: "baselined", permission: "review:decide", commentRequired: false, label: "Baseline", past: "baselined" },
  return: { action: "return", from: ["in_review"], to: "returned", permission: "review:decide", commentRequired: true, label: "Return to designer", past: "returned" },
  reopen: { action: "reopen", from: ["baselined"], to: "draft", permission: "review:decide", commentRequired: true, label: "Reopen as draft", past: "reopened" },
};

export const STATUS_WORD: Record<TourStatus, string> = {
  draft: "draft",
  in_review: "in review",
  returned: "returned",
  baselined: "baselined",
};

/** Why `action` cannot run from `status`, or null when it can. */
export function wrongStateMessage(action: ReviewAction, status: TourStatus): string | null {
  const t = TRANSITIONS[action];
  if (t.from.includes(status)) return null;
  const need = t.from.map((s) => STATUS_WORD[s]).join(" or ");
  return `This tour is ${STATUS_WORD[status]}; "${action}" needs a tour that is ${need}.`;
}

/** The actions offered for a status (before the role filter). */
export function actionsFrom(status: TourStatus): ReviewAction[] {
  return (Object.keys(TRANSITIONS) as ReviewAction[]).filter((a) => TRANSITIONS[a].from.includes(status));
}
