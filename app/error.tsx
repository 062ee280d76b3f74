"use client";

import { RouteError, type RouteErrorProps } from "@/components/shell/route-error";

/** Unexpected error outside the signed-in shell. */
export default function AppError(props: RouteErrorProps) {
  return (
    <main>
      <RouteError {...props} />
    </main>
  );
}
