/**
 * The role table of DESIGN.md, in one place. Route handlers, server actions and the UI all ask
 * `can(role, action)`; the server is the authority, the UI only hides what a role cannot do.
 */
export const ROLES = ["lead", "designer", "analyst", "viewer"] as const;
export type Role = (typeof ROLES)[number];

export type Action =
  | "tour:read" // read, replay, compare, export tours of the team
  | "tour:create" // create a tour, edit its chain and epochs, run searches, import
  | "tour:aim" // edit aim points, dispersion and flyby options
  | "comment"
  | "review:submit"
  | "review:decide" // return, baseline, reopen
  | "tour:delete"
  | "catalog:edit"
  | "team:manage"; // invite, change role, deactivate; Outbox; audit trail

const TABLE: Record<Action, readonly Role[]> = {
  "tour:read": ["lead", "designer", "analyst", "viewer"],
  "tour:create": ["lead", "designer"],
  "tour:aim": ["lead", "designer", "analyst"],
  comment: ["lead", "designer", "analyst"],
  "review:submit": ["lead", "designer"],
  "review:decide": ["lead"],
  "tour:delete": ["lead"],
  "catalog:edit": ["lead", "designer"],
  "team:manage": ["lead"],
};

export function can(role: Role, action: Action): boolean {
  return TABLE[action].includes(role);
}

export const ROLE_LABELS: Record<Role, string> = {
  lead: "Lead",
  designer: "Designer",
  analyst: "Analyst",
  viewer: "Viewer",
};
