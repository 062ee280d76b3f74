"use client";

import { useRouter, useSearchParams } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";

type FieldName = "email" | "password";
type FieldErrors = Partial<Record<FieldName, string>>;

interface ErrorBody {
  error?: string;
  message?: string;
  issues?: { path?: string; message?: string }[];
}

/** Only same-origin paths: "/tours/3" yes; "//evil", "/\\evil", "https://…" no. */
export function safeNext(raw: string | null): string {
  if (!raw || !raw.startsWith("/") || raw.startsWith("//") || raw.startsWith("/\\")) return "/tours";
  return raw;
}

export function SignInForm() {
  const router = useRouter();
  const params = useSearchParams();
  const [pending, setPending] = useState(false);
  const [fieldErrors, setFieldErrors] = useState<FieldErrors>({});
  const [message, setMessage] = useState<string | null>(null);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const email = String(form.get("email") ?? "").trim();
    const password = String(form.get("password") ?? "");

    setPending(true);
    setFieldErrors({});
    setMessage(null);

    let res: Response;
    try {
      res = await fetch("/api/session", {
        method: "POST",
        headers: { "content-type": "application/json", accept: "application/json" },
        body: JSON.stringify({ email, password }),
      });
    } catch {
      setPending(false);
      setMessage("Could not reach the server. Check your connection and try again.");
      return;
    }

    if (res.ok) {
      router.push(safeNext(params.get("next")));
      router.refresh();
      return; // stay pending while we navigate away
    }

    let body: ErrorBody = {};
    try {
      body = (await res.json()) as ErrorBody;
    } catch {
      /* not JSON: fall through to a generic message */
    }
    setPending(false);

    if (res.status === 400) {
      const next: FieldErrors = {};
      for (const issue of body.issues ?? []) {
        const key = (issue.path ?? "").split(".")[0];
        if ((key === "email" || key === "password") && !next[key]) next[key] = issue.message ?? "Check this field.";
      }
      setFieldErrors(next);
      if (Object.keys(next).length === 0) setMessage(body.message ?? "Check the form and try again.");
      return;
    }
    if (res.status === 401) {
      setMessage(body.message ?? "That e-mail and password do not match an account.");
      return;
    }
    if (res.status === 429) {
      setMessage(body.message ?? "Too many attempts. This account is locked for a while.");
      return;
    }
    setMessage(body.message ?? `Sign-in failed (HTTP ${res.status}). Try again in a moment.`);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-describedby={message ? "sign-in-message" : undefined}>
      <Field
        label="E-mail"
        name="email"
        type="email"
        autoComplete="username"
        inputMode="email"
        required
        autoFocus
        error={fieldErrors.email}
        placeholder="you@team.example"
      />
      <Field
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        required
        error={fieldErrors.password}
      />
      {message ? (
        <div
          id="sign-in-message"
          role="alert"
          className="flex items-start gap-2 rounded-md border border-bad/45 bg-bad-soft px-3 py-2 text-sm text-ink"
        >
          <svg viewBox="0 0 16 16" width="16" height="16" fill="none" aria-hidden className="mt-0.5 shrink-0 text-bad">
            <circle cx="8" cy="8" r="6.5" stroke="currentColor" strokeWidth="1.4" />
            <path d="M8 4.6v4" stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" />
            <circle cx="8" cy="11.2" r="0.9" fill="currentColor" />
          </svg>
          <span>{message}</span>
        </div>
      ) : null}
      <Button type="submit" variant="primary" size="lg" pending={pending} className="mt-2 w-full">
        Sign in
      </Button>
    </form>
  );
}
