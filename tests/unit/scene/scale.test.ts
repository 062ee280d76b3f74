import { describe, expect, it } from "vitest";
import { toScene, fromScene, fillScene, sceneRadius, kmFromSceneRadius, SCENE_UNITS_PER_AU } from "@/components/scene/scale";
import { AU_KM } from "@/lib/astro/constants";

const n3 = (a: ArrayLike<number>) => Math.hypot(a[0]!, a[1]!, a[2]!);

describe("scene scale", () => {
  it("linear: 1 AU is SCENE_UNITS_PER_AU units and the focus maps to the origin", () => {
    expect(toScene([AU_KM, 0, 0], [0, 0, 0], "linear")).toEqual([SCENE_UNITS_PER_AU, 0, 0]);
    const f = [5.2 * AU_KM, 0.3 * AU_KM, 0.01 * AU_KM];
    expect(toScene(f, f, "linear")).toEqual([0, 0, 0]);
    expect(toScene(f, f, "log")).toEqual([0, 0, 0]);
  });

  it("log: keeps directions, 1 AU still maps to SCENE_UNITS_PER_AU, and compresses the outer planets", () => {
    const p = toScene([0, AU_KM, 0], [0, 0, 0], "log");
    expect(p[0]).toBe(0);
    expect(p[1]).toBeCloseTo(SCENE_UNITS_PER_AU, 12);
    // Mercury (0.387 AU) and Neptune (30.07 AU): the ratio of scene radii is far below the true 78×.
    const merc = sceneRadius(0.387 * AU_KM, "log");
    const nep = sceneRadius(30.07 * AU_KM, "log");
    expect(nep / merc).toBeLessThan(6);
    expect(nep / merc).toBeGreaterThan(2);
    const d = toScene([3 * AU_KM, 4 * AU_KM, 0], [0, 0, 0], "log");
    expect(d[0] / d[1]).toBeCloseTo(0.75, 12);
  });

  it("is monotonic in heliocentric distance in both modes", () => {
    for (const mode of ["log", "linear"] as const) {
      let prev = -1;
      for (let au = 0; au < 50; au += 0.37) {
        const r = sceneRadius(au * AU_KM, mode);
        expect(r).toBeGreaterThan(prev);
        prev = r;
      }
    }
  });

  it("round-trips km → scene → km (float64) in both modes", () => {
    const focus = [-1.1e8, 7.3e7, 2.1e6];
    for (const mode of ["log", "linear"] as const) {
      for (const p of [[1e8, -2e8, 3e6], [7.4e8, 1.1e8, -1.6e7], [5e7, 1, 0], [4.5e9, -1e9, 2e7]]) {
        const back = fromScene(toScene(p, focus, mode), focus, mode);
        expect(n3([back[0] - p[0]!, back[1] - p[1]!, back[2] - p[2]!])).toBeLessThan(1e-6 * n3(p));
      }
      expect(kmFromSceneRadius(sceneRadius(2.5e8, mode), mode)).toBeCloseTo(2.5e8, 0);
    }
  });

  it("rebasing keeps a 1,000 km offset near Jupiter resolvable in float32", () => {
    // Without rebasing, float32 at 7.8e8 km (≈ 52 scene units) resolves ≈ 4e-6 units ≈ 60 km; with
    // rebasing a 1,000 km offset around the focus survives to better than 1 % (common practice:
    // float32 has 24 significant bits).
    const jup = [7.4e8, 2.0e8, -1.5e7];
    const near = [jup[0]! + 1000, jup[1]!, jup[2]!];
    const f32 = fillScene(new Float32Array(6), [...jup, ...near], jup, "linear");
    const dx = (f32[3]! - f32[0]!) / (SCENE_UNITS_PER_AU / AU_KM);
    expect(Math.abs(dx - 1000)).toBeLessThan(10);
  });

  it("rejects bad input with RangeError", () => {
    expect(() => toScene([NaN, 0, 0], [0, 0, 0], "log")).toThrow(RangeError);
    expect(() => toScene([1, 0, 0], [0, Infinity, 0], "linear")).toThrow(RangeError);
    expect(() => toScene([1, 0, 0], [0, 0, 0], "cubic" as never)).toThrow(RangeError);
    expect(() => sceneRadius(-1, "log")).toThrow(RangeError);
  });
});
