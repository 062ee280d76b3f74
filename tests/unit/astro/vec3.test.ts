import { describe, expect, it } from "vitest";
import { dot, cross, norm, add, sub, scale, unit, angleBetween, assertVec3, assertFinite, assertPositive } from "@/lib/astro/vec3";
import { stumpff } from "@/lib/astro/kepler";

describe("vec3 helpers (elementary vector algebra, common practice)", () => {
  it("computes the right-handed cross product and friends on tuples and Float64Arrays", () => {
    expect(cross([1, 0, 0], [0, 1, 0])).toEqual([0, 0, 1]); // x̂ × ŷ = ẑ
    expect(cross(new Float64Array([0, 1, 0]), [0, 0, 1])).toEqual([1, 0, 0]);
    expect(dot([1, 2, 3], [4, 5, 6])).toBe(32);
    expect(norm([3, 4, 12])).toBe(13);
    expect(add([1, 2, 3], [1, 1, 1])).toEqual([2, 3, 4]);
    expect(sub([1, 2, 3], [1, 1, 1])).toEqual([0, 1, 2]);
    expect(scale([1, 2, 3], 2)).toEqual([2, 4, 6]);
    expect(unit([0, 0, 5])).toEqual([0, 0, 1]);
    expect(angleBetween([1, 0, 0], [0, 1, 0])).toBeCloseTo(Math.PI / 2, 15);
    expect(angleBetween([1, 0, 0], [1, 1e-9, 0])).toBeCloseTo(1e-9, 20);
  });

  it("throws RangeError for bad input", () => {
    expect(() => unit([0, 0, 0])).toThrow(RangeError);
    expect(() => dot([1, Number.NaN, 0], [1, 1, 1])).toThrow(RangeError);
    expect(() => cross([1, 2] as unknown as [number, number, number], [1, 1, 1])).toThrow(RangeError);
    expect(() => add([Infinity, 0, 0], [1, 1, 1])).toThrow(RangeError);
    expect(() => assertVec3("r", [1, 2])).toThrow(/r must have 3 components/);
    expect(() => assertVec3("r", [1, 2, "x"])).toThrow(/r\[2\] must be a finite number/);
    expect(() => assertVec3("r", null)).toThrow(RangeError);
    expect(() => assertFinite("dt", Number.NaN)).toThrow(/dt must be a finite number/);
    expect(() => assertPositive("mu", 0)).toThrow(/mu must be positive/);
    expect(() => assertPositive("mu", -1)).toThrow(RangeError);
    expect(() => stumpff(Number.NaN)).toThrow(RangeError);
    assertVec3("ok", new Float64Array([1, 2, 3]));
  });
});
