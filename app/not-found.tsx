import type { Metadata } from "next";
import Link from "next/link";
import { GybeMark } from "@/components/brand/gybe-mark";
import { LinkButton } from "@/components/ui/button";

export const metadata: Metadata = { title: "Not found" };

/** 404: also what another team's records answer. */
export default function NotFound() {
  return (
    <main className="flex min-h-dvh flex-col items-center justify-center px-6 py-16 text-center">
      <svg viewBox="0 0 160 96" width="160" height="96" fill="none" aria-hidden className="mb-6">
        <ellipse cx="80" cy="48" rx="70" ry="26" className="stroke-line-strong" strokeDasharray="3 4" />
        <circle cx="80" cy="48" r="13" className="fill-neptune" opacity="0.8" />
        {/* a leg that missed its encounter and carries on */}
        <path d="M8 88C40 78 70 74 102 70s40-14 50-40" className="stroke-accent" strokeWidth="2" strokeLinecap="round" />
        <circle cx="152" cy="30" r="3.5" className="fill-accent" />
      </svg>
      <p className="num text-sm text-accent">404</p>
      <h1 className="mt-2 text-2xl font-semibold tracking-tight text-ink">No encounter here</h1>
      <p className="mt-2 max-w-md text-sm text-muted">
        This page does not exist, or it belongs to a team you are not on. Check the address, or go back to
        the tours you can see.
      </p>
      <div className="mt-6 flex flex-wrap items-center justify-center gap-3">
        <LinkButton href="/tours" variant="primary">
          Go to Tours
        </LinkButton>
        <LinkButton href="/" variant="ghost">
          Home
        </LinkButton>
      </div>
      <Link href="/" aria-label="Gybe home" className="mt-12 rounded-md opacity-70 hover:opacity-100">
        <GybeMark size={22} />
      </Link>
    </main>
  );
}
