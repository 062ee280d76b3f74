/** swr fetcher and JSON helpers that turn non-2xx answers into typed errors. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly body: Record<string, unknown>,
  ) {
    super(message);
  }
  get issues(): { path: string; message: string }[] {
    return (this.body.issues as { path: string; message: string }[] | undefined) ?? [];
  }
}

async function parse<T>(res: Response): Promise<T> {
  let body: Record<string, unknown> = {};
  try {
    body = (await res.json()) as Record<string, unknown>;
  } catch {
    // not JSON
  }
  if (!res.ok) {
    throw new ApiError(res.status, String(body.error ?? "http_error"), String(body.message ?? `Request failed (${res.status}).`), body);
  }
  return body as T;
}

export async function fetcher<T>(url: string): Promise<T> {
  return parse<T>(await fetch(url, { headers: { accept: "application/json" } }));
}

export async function sendJson<T>(url: string, method: "POST" | "PATCH" | "PUT" | "DELETE", body?: unknown): Promise<T> {
  return parse<T>(
    await fetch(url, {
      method,
      headers: { "content-type": "application/json", accept: "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    }),
  );
}
