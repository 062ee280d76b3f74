"use client";

import { useEffect } from "react";
import { Button, LinkButton } from "@/components/ui/button";

export interface RouteErrorProps {
  error: Error & { digest?: string };
  reset: () => void;
}

/** The body of error.tsx boundaries: what happened, a retry, a way back. */
export function RouteError({ error, reset }: RouteErrorProps) {
  useEffect(() => {
    console.error(error);
  }, [error]);

  return (
    <div className="flex min-h-[60dvh] flex-col items-center justify-center px-6 py-16 text-center">
      <svg viewBox="0 0 48 48" width="48" height="48" fill="none" aria-hidden className="mb-5 text-bad">
        <circle cx="24" cy="24" r="20" stroke="currentColor" strokeWidth="1.6" strokeDasharray="4 3" />
        <path d="M24 14v12" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" />
        <circle cx="24" cy="32.5" r="1.6" fill="currentColor" />
      </svg>
      <h1 className="text-2xl font-semibold tracking-tight text-ink">Something went wrong</h1>
      <p className="mt-2 max-w-md text-sm text-muted">
        Gybe hit an unexpected error while showing this screen. Nothing you saved is lost. Try again; if it
        keeps happening, tell your team lead what you were doing.
      </p>
      {error.digest ? (
        <p className="mt-3 text-xs text-faint">
          Reference <span className="num text-muted">{error.digest}</span>
        </p>
      ) : null}
      <div className="mt-6 flex flex-wrap items-center justify-center gap-3">
        <Button variant="primary" onClick={() => reset()}>
          Try again
        </Button>
        <LinkButton href="/tours" variant="ghost">
          Back to Tours
        </LinkButton>
      </div>
    </div>
  );
}
