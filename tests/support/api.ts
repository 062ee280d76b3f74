/** Helpers for route-handler tests: build requests, call handlers, sign in as a user. */
import { useJar } from "./cookie-jar";

export function req(method: string, url: string, body?: unknown, raw?: string): Request {
  return new Request(`http://localhost${url}`, {
    method,
    headers: { "content-type": "application/json" },
    body: raw !== undefined ? raw : body === undefined ? undefined : JSON.stringify(body),
  });
}

export function ctx<P extends Record<string, string>>(params: P): { params: Promise<P> } {
  return { params: Promise.resolve(params) };
}

export async function call(res: Promise<Response> | Response): Promise<{ status: number; body: any }> {
  const r = await res;
  const text = await r.text();
  return { status: r.status, body: text ? JSON.parse(text) : null };
}

/** Switch to the cookie jar of `email` and sign in there (once per jar). */
export async function as(email: string, password: string): Promise<void> {
  useJar(email);
  const session = await import("@/app/api/session/route");
  const r = await call(session.POST(req("POST", "/api/session", { email, password }), {}));
  if (r.status !== 200) throw new Error(`sign-in as ${email} failed: ${r.status} ${JSON.stringify(r.body)}`);
}

export function anonymous(): void {
  useJar("anonymous");
}
