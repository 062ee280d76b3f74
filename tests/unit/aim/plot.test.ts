import { describe, expect, it } from "vitest";
import { niceStep, plotExtent, reexpressAim, symmetricTicks } from "@/lib/aim/plot";
import type { Vec3 } from "@/lib/astro/types";

describe("B-plane plot helpers", () => {
  it("niceStep picks 1/2/5 × 10^k", () => {
    expect(niceStep(10000, 4)).toBe(2000);
    expect(niceStep(7000, 4)).toBe(2000);
    expect(niceStep(3000, 4)).toBe(1000);
    expect(niceStep(26000, 4)).toBe(5000);
    expect(() => niceStep(0)).toThrow(RangeError);
  });

  it("symmetricTicks are symmetric multiples of the step inside the half-width", () => {
    const t = symmetricTicks(11000, 4);
    expect(t).toEqual([-10000, -8000, -6000, -4000, -2000, 0, 2000, 4000, 6000, 8000, 10000]);
    expect(t[0]).toBe(-t[t.length - 1]!);
    expect(t.includes(0)).toBe(true);
  });

  it("plotExtent covers points and circles with padding", () => {
    expect(plotExtent([{ x: 100, y: -300 }], [200], 1.5)).toBe(450);
    expect(plotExtent([], [], 2)).toBe(2);
  });

  it("reexpressAim keeps |B| and rotates by the angle between the two T axes", () => {
    const a = 0.3;
    const from = { T: [1, 0, 0] as Vec3, R: [0, 1, 0] as Vec3 };
    const to = { T: [Math.cos(a), Math.sin(a), 0] as Vec3, R: [-Math.sin(a), Math.cos(a), 0] as Vec3 };
    const r = reexpressAim(1000, 0, from, to);
    expect(Math.hypot(r.bT, r.bR)).toBeCloseTo(1000, 9);
    expect(Math.atan2(r.bR, r.bT)).toBeCloseTo(-a, 12);
  });
});
