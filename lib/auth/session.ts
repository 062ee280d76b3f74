/** The sealed session cookie (iron-session): it carries only the user id; the rest is re-read. */
import type { SessionOptions } from "iron-session";
import { sessionSecret } from "@/lib/env";

export interface SessionData {
  userId?: number;
}

export function sessionOptions(): SessionOptions {
  return {
    password: sessionSecret(),
    cookieName: "gybe_session",
    ttl: 60 * 60 * 12,
    cookieOptions: {
      httpOnly: true,
      sameSite: "lax",
      secure: process.env.NODE_ENV === "production" && process.env.COOKIE_INSECURE !== "1",
      path: "/",
    },
  };
}
