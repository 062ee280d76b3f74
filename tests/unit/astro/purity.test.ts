/**
 * lib/astro stays pure: the worker, the server and the tests import the same code, so it may not
 * import React, Next, the DOM, Node built-ins or the database (common practice for a shared core).
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const dir = path.join(process.cwd(), "lib", "astro");
const files = fs.readdirSync(dir).filter((f) => f.endsWith(".ts"));
const ALLOWED = /^(\.\/|astronomy-engine$)/;

describe("lib/astro purity", () => {
  it("has modules to check", () => {
    expect(files.length).toBeGreaterThan(10);
  });
  for (const f of files) {
    it(`${f} imports only lib/astro modules and astronomy-engine`, () => {
      const src = fs.readFileSync(path.join(dir, f), "utf8");
      const specs = [...src.matchAll(/^\s*(?:import|export)[^"']*from\s+["']([^"']+)["']/gm)].map((m) => m[1]!);
      const bad = specs.filter((s) => !ALLOWED.test(s));
      expect(bad).toEqual([]);
      expect(src).not.toMatch(/\b(window|document|process|require)\s*[.(]/);
    });
  }
});
