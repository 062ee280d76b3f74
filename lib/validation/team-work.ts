/**
 * Schemas for team work: revisions (list, compare, restore), review transitions, comments,
 * member changes and invitations. Shared by route handlers and the client forms.
 */
import * as v from "valibot";
import { emailSchema, passwordSchema } from "./auth";
import { nodeIdSchema } from "./tour";

const versionSchema = v.pipe(
  v.number("version is required (the version of the tour you are looking at)"),
  v.integer("version must be a whole number"),
  v.minValue(1, "version must be ≥ 1"),
);

const pageParam = (what: string, max: number) =>
  v.optional(v.pipe(v.string(), v.regex(/^\d{1,6}$/, `${what} must be a whole number`), v.transform(Number), v.maxValue(max, `${what} must be ≤ ${max}`)));

/** GET /api/tours/[id]/revisions: `?compare=a,b` (two version numbers) gives the diff from a to b. */
export const revisionsQuerySchema = v.object({
  compare: v.optional(
    v.pipe(
      v.string(),
      v.regex(/^[1-9]\d{0,8},[1-9]\d{0,8}$/, "compare is two version numbers separated by a comma, e.g. 3,5"),
      v.transform((s) => s.split(",").map(Number) as [number, number]),
    ),
  ),
  limit: pageParam("limit", 500),
  offset: pageParam("offset", 1_000_000),
});

/** POST /api/tours/[id]/revisions: restore an older version as a new revision. */
export const restoreSchema = v.object({
  restoreVersion: v.pipe(v.number("restoreVersion is required (the version to restore)"), v.integer("restoreVersion must be a whole number"), v.minValue(1, "restoreVersion must be ≥ 1")),
  version: versionSchema,
});

export const REVIEW_ACTIONS = ["submit", "baseline", "return", "reopen"] as const;
export type ReviewAction = (typeof REVIEW_ACTIONS)[number];

export const COMMENT_MAX = 4000;

const optionalComment = v.optional(
  v.pipe(v.string("comment must be text"), v.trim(), v.maxLength(COMMENT_MAX, `a comment is at most ${COMMENT_MAX} characters`)),
);

/** POST /api/tours/[id]/review. "return" and "reopen" need a comment (checked after the role). */
export const reviewSchema = v.object({
  action: v.picklist(REVIEW_ACTIONS, "action must be submit, baseline, return or reopen"),
  comment: optionalComment,
  version: versionSchema,
});

/** POST /api/tours/[id]/comments. */
export const commentSchema = v.object({
  body: v.pipe(
    v.string("body is required"),
    v.trim(),
    v.minLength(1, "write something first"),
    v.maxLength(COMMENT_MAX, `a comment is at most ${COMMENT_MAX} characters`),
  ),
  nodeId: v.optional(v.nullable(nodeIdSchema)),
});

export const ROLE_VALUES = ["lead", "designer", "analyst", "viewer"] as const;
const roleSchema = v.picklist(ROLE_VALUES, "role must be lead, designer, analyst or viewer");

/** PATCH /api/team/members/[userId]. */
export const memberPatchSchema = v.pipe(
  v.object({
    role: v.optional(roleSchema),
    active: v.optional(v.boolean("active must be true or false")),
  }),
  v.check((p) => p.role !== undefined || p.active !== undefined, "send role, active or both"),
);

/** POST /api/team/invitations. */
export const invitationSchema = v.object({
  email: emailSchema,
  role: roleSchema,
});

export const personNameSchema = v.pipe(
  v.string("name is required"),
  v.trim(),
  v.minLength(1, "name is required"),
  v.maxLength(120, "name is at most 120 characters"),
);

/** POST /api/invitations/[token]. */
export const acceptInvitationSchema = v.object({
  name: personNameSchema,
  password: passwordSchema,
});

/** An invitation token as e-mailed: 32 random bytes, base64url (43 characters). */
export const TOKEN_RE = /^[A-Za-z0-9_-]{43}$/;
