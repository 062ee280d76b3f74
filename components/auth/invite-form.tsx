"use client";

import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { ApiError, sendJson } from "@/lib/client/fetcher";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { InlineAlert } from "@/components/review/inline-alert";
import { useMounted } from "@/components/review/use-mounted";

export interface InviteFormProps {
  token: string;
  email: string;
}

type Errors = Partial<Record<"name" | "password" | "confirm", string>>;

/** Accept an invitation: name, password twice. On success the new member is signed in and lands on Tours. */
export function InviteForm({ token, email }: InviteFormProps) {
  const router = useRouter();
  const ready = useMounted();
  const [pending, setPending] = useState(false);
  const [errors, setErrors] = useState<Errors>({});
  const [message, setMessage] = useState<string | null>(null);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const name = String(form.get("name") ?? "").trim();
    const password = String(form.get("password") ?? "");
    const confirm = String(form.get("confirm") ?? "");
    const next: Errors = {};
    if (!name) next.name = "Enter your name as the team should see it.";
    if (password.length < 10) next.password = "Use at least 10 characters.";
    if (confirm !== password) next.confirm = "The two passwords differ.";
    setErrors(next);
    setMessage(null);
    if (Object.keys(next).length) return;
    setPending(true);
    try {
      await sendJson(`/api/invitations/${encodeURIComponent(token)}`, "POST", { name, password });
      router.push("/tours");
      router.refresh();
    } catch (err) {
      setPending(false);
      if (err instanceof ApiError && err.status === 400 && err.issues.length) {
        const fe: Errors = {};
        for (const i of err.issues) if (i.path === "name" || i.path === "password") fe[i.path] ??= i.message;
        setErrors(fe);
      } else if (err instanceof ApiError && err.status === 404) {
        setMessage(err.message);
        router.refresh();
      } else setMessage(err instanceof ApiError ? err.message : "Could not reach the server. Try again.");
    }
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" data-testid="invite-form" data-ready={ready || undefined}>
      <Field label="E-mail" name="email" value={email} readOnly disabled autoComplete="username" />
      <Field label="Name" name="name" autoComplete="name" required autoFocus error={errors.name} maxLength={120} />
      <Field label="Password" name="password" type="password" autoComplete="new-password" required error={errors.password} hint="At least 10 characters." />
      <Field label="Confirm password" name="confirm" type="password" autoComplete="new-password" required error={errors.confirm} />
      {message ? <InlineAlert>{message}</InlineAlert> : null}
      <Button type="submit" variant="primary" size="lg" pending={pending} className="mt-2 w-full">
        Join team
      </Button>
    </form>
  );
}
