"use client";
/**
 * Scene colours read from the theme's CSS variables (the single source of the palette). WebGL
 * needs sRGB: the browser converts the variable's value (oklch) by painting one pixel on a
 * 2D canvas. Falls back to the given hex outside a browser or when the variable is missing.
 */
const cache = new Map<string, string>();

export function cssColor(varName: string, fallback: string): string {
  const hit = cache.get(varName);
  if (hit) return hit;
  if (typeof document === "undefined") return fallback;
  let out = fallback;
  try {
    const raw = getComputedStyle(document.documentElement).getPropertyValue(varName).trim();
    const c = document.createElement("canvas");
    c.width = c.height = 1;
    const ctx = c.getContext("2d", { willReadFrequently: true });
    if (raw && ctx) {
      ctx.fillStyle = fallback;
      ctx.fillStyle = raw;
      ctx.fillRect(0, 0, 1, 1);
      const [r, g, b] = ctx.getImageData(0, 0, 1, 1).data;
      out = "#" + [r, g, b].map((x) => (x ?? 0).toString(16).padStart(2, "0")).join("");
    }
  } catch {
    out = fallback;
  }
  cache.set(varName, out);
  return out;
}

/** Muted planet tone by id (custom small bodies share one tone; labels and shapes carry meaning). */
export function bodyColor(id: string): string {
  const name = id.startsWith("custom:") ? "small-body" : id;
  return cssColor(`--gy-${name}`, "#9aa3b5");
}
