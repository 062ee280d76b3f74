"use client";

import { useEffect, useState } from "react";

/** True once the component has hydrated; panels expose it as `data-ready` so tests wait for interactivity. */
export function useMounted(): boolean {
  const [mounted, setMounted] = useState(false);
  useEffect(() => setMounted(true), []);
  return mounted;
}
