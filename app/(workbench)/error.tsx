"use client";

import { RouteError, type RouteErrorProps } from "@/components/shell/route-error";

/** Unexpected error inside a signed-in screen: the top bar stays, the screen offers a retry. */
export default function WorkbenchError(props: RouteErrorProps) {
  return <RouteError {...props} />;
}
