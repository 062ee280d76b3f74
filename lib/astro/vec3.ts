/**
 * Small 3-vector helpers and input validation.
 *
 * Vectors are plain `[x, y, z]` tuples on output; inputs may be tuples or Float64Arrays
 * (length ≥ 3). The arithmetic helpers check their result (one test, cheap): a non-finite
 * result — from a NaN/Infinity/missing component or an overflow — throws RangeError. The helpers are unit- and frame-agnostic: the result carries the unit and
 * frame of its inputs. Validation helpers throw `RangeError` naming the argument and why.
 * Source: elementary vector algebra (common practice).
 */
import type { Vec3, Vec3Like } from "./types";

/** Dot product a·b (unit: product of the inputs' units; any frame, both in the same frame). */
export function dot(a: Vec3Like, b: Vec3Like): number {
  const d = a[0]! * b[0]! + a[1]! * b[1]! + a[2]! * b[2]!;
  if (!Number.isFinite(d)) bad("dot");
  return d;
}

function bad(fn: string): never {
  throw new RangeError(`${fn}: arguments must be finite 3-vectors (result is not finite)`);
}

function chk(fn: string, v: Vec3): Vec3 {
  if (!Number.isFinite(v[0] + v[1] + v[2])) bad(fn);
  return v;
}

/** Cross product a×b as a new tuple (same frame as the inputs, right-handed). */
export function cross(a: Vec3Like, b: Vec3Like): Vec3 {
  const ax = a[0]!, ay = a[1]!, az = a[2]!;
  const bx = b[0]!, by = b[1]!, bz = b[2]!;
  return chk("cross", [ay * bz - az * by, az * bx - ax * bz, ax * by - ay * bx]);
}

/** Euclidean norm |a| (unit of the input). */
export function norm(a: Vec3Like): number {
  const n = Math.hypot(a[0]!, a[1]!, a[2]!);
  if (!Number.isFinite(n)) bad("norm");
  return n;
}

/** Squared norm |a|² (unit of the input squared). */
export function norm2(a: Vec3Like): number {
  const n = a[0]! * a[0]! + a[1]! * a[1]! + a[2]! * a[2]!;
  if (!Number.isFinite(n)) bad("norm2");
  return n;
}

/** a + b as a new tuple. */
export function add(a: Vec3Like, b: Vec3Like): Vec3 {
  return chk("add", [a[0]! + b[0]!, a[1]! + b[1]!, a[2]! + b[2]!]);
}

/** a − b as a new tuple. */
export function sub(a: Vec3Like, b: Vec3Like): Vec3 {
  return chk("sub", [a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!]);
}

/** s·a as a new tuple. */
export function scale(a: Vec3Like, s: number): Vec3 {
  return chk("scale", [a[0]! * s, a[1]! * s, a[2]! * s]);
}

/** a + s·b as a new tuple. */
export function addScaled(a: Vec3Like, b: Vec3Like, s: number): Vec3 {
  return chk("addScaled", [a[0]! + s * b[0]!, a[1]! + s * b[1]!, a[2]! + s * b[2]!]);
}

/** Unit vector a/|a| (dimensionless). Throws RangeError for a zero or non-finite vector. */
export function unit(a: Vec3Like, name = "vector"): Vec3 {
  const n = Math.hypot(a[0]!, a[1]!, a[2]!);
  if (!(n > 0) || !Number.isFinite(n)) {
    throw new RangeError(`${name} must be a non-zero finite vector (|${name}| = ${n})`);
  }
  return [a[0]! / n, a[1]! / n, a[2]! / n];
}

/** Copy of a vector as a plain tuple. */
export function toVec3(a: Vec3Like): Vec3 {
  return chk("toVec3", [a[0]!, a[1]!, a[2]!]);
}

/** Angle between two non-zero vectors, rad in [0, π] (numerically robust atan2 form). */
export function angleBetween(a: Vec3Like, b: Vec3Like): number {
  return Math.atan2(norm(cross(a, b)), dot(a, b));
}

/** Throws RangeError unless `x` is a finite number. */
export function assertFinite(name: string, x: number): void {
  if (typeof x !== "number" || !Number.isFinite(x)) {
    throw new RangeError(`${name} must be a finite number (got ${String(x)})`);
  }
}

/** Throws RangeError unless `x` is a finite number > 0. */
export function assertPositive(name: string, x: number): void {
  assertFinite(name, x);
  if (!(x > 0)) throw new RangeError(`${name} must be positive (got ${x})`);
}

/** Throws RangeError unless `x` is a finite number ≥ 0. */
export function assertNonNegative(name: string, x: number): void {
  assertFinite(name, x);
  if (!(x >= 0)) throw new RangeError(`${name} must be non-negative (got ${x})`);
}

/**
 * Throws RangeError unless `v` is a tuple/array/Float64Array with at least 3 finite components.
 */
export function assertVec3(name: string, v: unknown): asserts v is Vec3Like {
  if (v == null || typeof v !== "object" || typeof (v as { length?: unknown }).length !== "number") {
    throw new RangeError(`${name} must be a 3-vector [x, y, z] (got ${String(v)})`);
  }
  const a = v as ArrayLike<unknown>;
  if (a.length < 3) throw new RangeError(`${name} must have 3 components (got ${a.length})`);
  for (let k = 0; k < 3; k++) {
    const c = a[k];
    if (typeof c !== "number" || !Number.isFinite(c)) {
      throw new RangeError(`${name}[${k}] must be a finite number (got ${String(c)})`);
    }
  }
}

/** Throws RangeError unless `v` is a finite 3-vector with non-zero length. */
export function assertNonZeroVec3(name: string, v: unknown): asserts v is Vec3Like {
  assertVec3(name, v);
  if (!(norm(v) > 0)) throw new RangeError(`${name} must be non-zero (zero radius or zero vector)`);
}
