"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { ApiError, sendJson } from "@/lib/client/fetcher";

/** "New tour": asks for a name, creates an Earth → Mars starter tour and opens it in the Workbench. */
export function NewTourButton() {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [name, setName] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setPending(true);
    setError(null);
    try {
      const t = await sendJson<{ id: number }>("/api/tours", "POST", { name });
      router.push(`/tours/${t.id}`);
    } catch (err) {
      setError(err instanceof ApiError ? (err.issues[0]?.message ?? err.message) : "Could not create the tour.");
      setPending(false);
    }
  }

  if (!open) {
    return (
      <Button variant="primary" onClick={() => setOpen(true)}>
        New tour
      </Button>
    );
  }
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-2 rounded-lg border border-line bg-surface p-3" aria-label="New tour">
      <Field label="Tour name" value={name} onChange={(e) => setName(e.target.value)} error={error ?? undefined} autoFocus maxLength={120} required />
      <Button type="submit" variant="primary" disabled={pending}>{pending ? "Creating…" : "Create"}</Button>
      <Button type="button" variant="ghost" onClick={() => setOpen(false)}>Cancel</Button>
    </form>
  );
}
