"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { cn } from "@/components/ui/cn";
import { Spinner } from "@/components/ui/spinner";
import type { ShellUser } from "./types";

export interface UserMenuProps {
  user: ShellUser;
  className?: string;
}

function initials(name: string): string {
  const parts = name.trim().split(/\s+/).filter(Boolean);
  const first = parts[0]?.[0] ?? "?";
  const last = parts.length > 1 ? (parts[parts.length - 1]?.[0] ?? "") : "";
  return (first + last).toUpperCase();
}

/**
 * The signed-in user's name, role and team, and a "Sign out" button that ends the session
 * (DELETE /api/session) and returns to /sign-in. Everything is visible at once: no hidden menu.
 */
export function UserMenu({ user, className }: UserMenuProps) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function signOut() {
    setPending(true);
    setError(null);
    try {
      const res = await fetch("/api/session", { method: "DELETE", headers: { accept: "application/json" } });
      // 401 means the session was already gone: that is a successful sign-out too.
      if (!res.ok && res.status !== 401) throw new Error(`HTTP ${res.status}`);
      router.push("/sign-in");
      router.refresh();
    } catch {
      setPending(false);
      setError("Sign-out failed. Try again.");
    }
  }

  return (
    <div className={cn("flex items-center gap-2", className)}>
      <div className="flex min-w-0 items-center gap-2.5" title={user.email} data-testid="user-menu">
        <span
          aria-hidden
          className="grid size-8 shrink-0 place-items-center rounded-full border border-line-strong bg-raised text-xs font-semibold text-ink"
        >
          {initials(user.name)}
        </span>
        <span className="hidden min-w-0 flex-col leading-tight md:flex">
          <span className="truncate text-sm font-medium text-ink">{user.name}</span>
          <span className="truncate text-xs text-muted">
            <span data-role={user.role}>{user.role}</span>
            <span aria-hidden> · </span>
            <span>{user.teamName}</span>
          </span>
        </span>
        <span className="sr-only md:hidden">
          {user.name}, {user.role}, {user.teamName}
        </span>
      </div>
      <button
        type="button"
        onClick={signOut}
        disabled={pending}
        aria-busy={pending || undefined}
        aria-label="Sign out"
        className="inline-flex h-8 items-center gap-1.5 rounded-md px-2.5 text-sm text-muted transition-colors hover:bg-raised hover:text-ink disabled:opacity-60"
      >
        {pending ? (
          <Spinner size={14} />
        ) : (
          <svg viewBox="0 0 16 16" width="14" height="14" fill="none" aria-hidden>
            <path d="M6 2.5H3.5a1 1 0 0 0-1 1v9a1 1 0 0 0 1 1H6" stroke="currentColor" strokeWidth="1.4" strokeLinecap="round" />
            <path d="M10.5 5 13.5 8l-3 3M13.3 8H6.5" stroke="currentColor" strokeWidth="1.4" strokeLinecap="round" strokeLinejoin="round" />
          </svg>
        )}
        <span className="hidden sm:inline">Sign out</span>
      </button>
      {error ? (
        <span role="status" className="text-xs text-bad">
          {error}
        </span>
      ) : null}
    </div>
  );
}
