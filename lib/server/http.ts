/**
 * Route-handler plumbing: JSON answers, typed HTTP errors, valibot parsing with per-field issues.
 * Every handler is wrapped in `handle()`, so an HttpError becomes its status and anything else
 * becomes a logged 500 (a 500 from bad input is a bug: validate first).
 */
import "server-only";
import * as v from "valibot";
import { NextResponse } from "next/server";

export interface FieldIssue {
  path: string;
  message: string;
}

export class HttpError extends Error {
  constructor(
    readonly status: 400 | 401 | 403 | 404 | 409 | 413 | 429,
    readonly code: string,
    message: string,
    readonly extra: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

export const badRequest = (message: string, issues?: FieldIssue[]) =>
  new HttpError(400, "validation_failed", message, issues ? { issues } : {});
export const unauthorized = () => new HttpError(401, "unauthorized", "Sign in to continue.");
export const forbidden = (message = "Your role does not allow this.") => new HttpError(403, "forbidden", message);
export const notFound = (what = "Record") => new HttpError(404, "not_found", `${what} not found.`);

export function json(data: unknown, status = 200, headers?: HeadersInit): NextResponse {
  return NextResponse.json(data, { status, headers });
}

export function errorJson(err: HttpError): NextResponse {
  return NextResponse.json({ error: err.code, message: err.message, ...err.extra }, { status: err.status });
}

type Handler<C> = (req: Request, ctx: C) => Promise<Response>;

/** Wrap a route handler: HttpError → its status; anything else → 500 with a generic message. */
export function handle<C>(fn: Handler<C>): Handler<C> {
  return async (req, ctx) => {
    try {
      return await fn(req, ctx);
    } catch (err) {
      if (err instanceof HttpError) return errorJson(err);
      console.error("[gybe] unhandled error in route handler:", err);
      return json({ error: "internal", message: "Something went wrong on the server; it has been logged." }, 500);
    }
  };
}

export function issuesOf(issues: v.BaseIssue<unknown>[]): FieldIssue[] {
  return issues.map((i) => ({ path: v.getDotPath(i) ?? "", message: i.message }));
}

/** Validate any value; a failure throws 400 with one message per field. */
export function parseWith<S extends v.GenericSchema>(schema: S, value: unknown, what = "request"): v.InferOutput<S> {
  const r = v.safeParse(schema, value);
  if (!r.success) {
    const issues = issuesOf(r.issues);
    const first = issues[0];
    throw badRequest(
      `Invalid ${what}: ${first ? (first.path ? `${first.path}: ` : "") + first.message : "bad input"}` +
        (issues.length > 1 ? ` (and ${issues.length - 1} more)` : ""),
      issues,
    );
  }
  return r.output;
}

/** Read the body as JSON (400 `invalid_json` when it is not) and validate it. */
export async function parseJson<S extends v.GenericSchema>(req: Request, schema: S, maxBytes = 2_000_000): Promise<v.InferOutput<S>> {
  const text = await req.text();
  if (text.length > maxBytes) throw new HttpError(413, "too_large", `The request body is larger than ${Math.round(maxBytes / 1000)} kB.`);
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch {
    throw new HttpError(400, "invalid_json", "The request body is not valid JSON.");
  }
  return parseWith(schema, body, "request body");
}

/** Validate URL search parameters (as a plain object of strings). */
export function parseQuery<S extends v.GenericSchema>(req: Request, schema: S): v.InferOutput<S> {
  const params = Object.fromEntries(new URL(req.url).searchParams.entries());
  return parseWith(schema, params, "query");
}

/** A positive integer id from a route parameter; anything else is 404 (there is no such record). */
export function idParam(raw: string | undefined, what = "Record"): number {
  if (!raw || !/^[1-9]\d{0,9}$/.test(raw)) throw notFound(what);
  return Number(raw);
}
