import type { Metadata } from "next";
import Link from "next/link";
import { Suspense } from "react";
import { redirect } from "next/navigation";
import { getCurrentUser } from "@/lib/auth/dal";
import { GybeMark } from "@/components/brand/gybe-mark";
import { SignInForm } from "@/components/auth/sign-in-form";
import { Skeleton } from "@/components/ui/spinner";

export const metadata: Metadata = { title: "Sign in" };

function FormFallback() {
  return (
    <div className="flex flex-col gap-4" aria-hidden>
      <Skeleton className="h-4 w-16" />
      <Skeleton className="h-9 w-full" />
      <Skeleton className="h-4 w-20" />
      <Skeleton className="h-9 w-full" />
      <Skeleton className="mt-2 h-11 w-full" />
    </div>
  );
}

export const dynamic = "force-dynamic";

export default async function SignInPage() {
  // Someone already signed in goes straight to the team's tours.
  if (await getCurrentUser()) redirect("/tours");
  return (
    <div className="relative flex min-h-dvh flex-col">
      <div
        aria-hidden
        className="pointer-events-none absolute inset-0 bg-[radial-gradient(ellipse_at_50%_-10%,var(--gy-accent-soft),transparent_55%)]"
      />
      <main className="relative flex flex-1 items-center justify-center px-4 py-12">
        <div className="w-full max-w-sm">
          <div className="mb-8 flex flex-col items-center text-center">
            <Link href="/" aria-label="Gybe home" className="rounded-md">
              <GybeMark size={48} />
            </Link>
            <h1 className="mt-4 text-2xl font-semibold tracking-tight text-ink">Sign in to Gybe</h1>
            <p className="mt-1 text-sm text-muted">Your team&apos;s tours, aim points and reviews.</p>
          </div>
          <div className="rounded-panel border border-line bg-surface p-6 shadow-panel">
            <Suspense fallback={<FormFallback />}>
              <SignInForm />
            </Suspense>
          </div>
          <p className="mt-6 text-center text-xs leading-relaxed text-faint">
            No account? Ask your team lead for an invitation.
            <br />
            <Link href="/" className="text-muted underline-offset-2 hover:text-ink hover:underline">
              What is Gybe?
            </Link>
          </p>
        </div>
      </main>
    </div>
  );
}
