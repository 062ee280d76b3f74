/**
 * The stored tour: one valibot schema shared by forms, route handlers and imports (DESIGN.md
 * "Stored tours and the API"). Epochs are TDB seconds past J2000; distances km; angles rad.
 */
import * as v from "valibot";

export const PLANETS = ["mercury", "venus", "earth", "mars", "jupiter", "saturn", "uranus", "neptune", "pluto"] as const;

/** ±300 years around J2000, in TDB seconds: generous, but catches days-vs-seconds mix-ups. */
const EPOCH_LIMIT_S = 300 * 365.25 * 86400;

export const epochSchema = v.pipe(
  v.number("epoch must be a number (TDB seconds past J2000)"),
  v.finite("epoch must be finite"),
  v.minValue(-EPOCH_LIMIT_S, "epoch is more than 300 years before J2000"),
  v.maxValue(EPOCH_LIMIT_S, "epoch is more than 300 years after J2000"),
);

export const customSlugSchema = v.pipe(
  v.string(),
  v.regex(/^[a-z0-9][a-z0-9-]{0,47}$/, "a slug is 1–48 lower-case letters, digits or dashes"),
);

export const bodyIdSchema = v.union(
  [
    v.picklist(PLANETS),
    v.pipe(v.string(), v.regex(/^custom:[a-z0-9][a-z0-9-]{0,47}$/)),
  ],
  "body must be a planet id (mercury … pluto) or custom:<slug>",
);

export const nodeIdSchema = v.pipe(
  v.string("node id must be a string"),
  v.regex(/^[A-Za-z0-9_-]{1,64}$/, "node id is 1–64 letters, digits, _ or -"),
);

const windowSchema = v.pipe(
  v.object({ start: epochSchema, end: epochSchema }),
  v.check((w) => w.end >= w.start, "window end must not be before its start"),
);

export const nodeSchema = v.object({
  id: nodeIdSchema,
  body: bodyIdSchema,
  epoch: epochSchema,
  window: v.optional(windowSchema),
});

export const legSchema = v.object({
  revs: v.optional(v.pipe(v.number(), v.integer("revs must be a whole number"), v.minValue(0, "revs must be ≥ 0"), v.maxValue(5, "revs must be ≤ 5"))),
  branch: v.optional(v.picklist(["left", "right"], "branch must be left or right")),
  prograde: v.optional(v.boolean("prograde must be true or false")),
});

export const arrivalSchema = v.variant(
  "kind",
  [
    v.object({ kind: v.literal("flyby") }),
    v.object({ kind: v.literal("rendezvous") }),
    v.object({
      kind: v.literal("capture"),
      rp: v.pipe(v.number(), v.finite(), v.gtValue(0, "capture rp must be > 0 km")),
      e: v.pipe(v.number(), v.finite(), v.minValue(0, "capture e must be ≥ 0"), v.ltValue(1, "capture e must be < 1")),
    }),
  ],
  "arrival kind must be flyby, rendezvous or capture",
);

export const aimSchema = v.object({
  bT: v.pipe(v.number(), v.finite("B·T must be finite")),
  bR: v.pipe(v.number(), v.finite("B·R must be finite")),
  sigmaT: v.pipe(v.number(), v.finite(), v.minValue(0, "σT must be ≥ 0 km")),
  sigmaR: v.pipe(v.number(), v.finite(), v.minValue(0, "σR must be ≥ 0 km")),
  rho: v.pipe(v.number(), v.finite(), v.minValue(-1, "ρ must be in [−1, 1]"), v.maxValue(1, "ρ must be in [−1, 1]")),
  pole: v.picklist(["ecliptic", "spin"], "pole must be ecliptic or spin"),
});

export const ephemerisChoiceSchema = v.object({
  kind: v.picklist(["vsop", "mean"], "ephemeris kind must be vsop or mean"),
  cached: v.optional(v.boolean()),
});

export const storedTourSchema = v.pipe(
  v.object({
    formatVersion: v.literal(1, "formatVersion must be 1"),
    ephemeris: ephemerisChoiceSchema,
    nodes: v.pipe(
      v.array(nodeSchema, "nodes must be a list"),
      v.minLength(2, "a tour needs at least two nodes (launch and arrival)"),
      v.maxLength(12, "a tour has at most 12 nodes"),
    ),
    legs: v.optional(v.array(legSchema), []),
    arrival: v.optional(arrivalSchema, { kind: "flyby" }),
    rpMin: v.optional(
      v.record(bodyIdSchema, v.pipe(v.number(), v.finite(), v.gtValue(0, "rpMin must be > 0 km"))),
      {},
    ),
    aim: v.optional(v.record(nodeIdSchema, aimSchema), {}),
  }),
  v.check((t) => new Set(t.nodes.map((n) => n.id)).size === t.nodes.length, "node ids must be unique"),
  v.check((t) => t.legs.length === 0 || t.legs.length === t.nodes.length - 1, "legs must have one entry per leg (nodes − 1)"),
  v.check((t) => Object.keys(t.aim).every((k) => t.nodes.some((n) => n.id === k)), "every aim entry must name a node of the tour"),
);

export type StoredTour = v.InferOutput<typeof storedTourSchema>;
export type StoredNode = StoredTour["nodes"][number];
export type StoredAim = v.InferOutput<typeof aimSchema>;

export const tourNameSchema = v.pipe(
  v.string("name must be text"),
  v.trim(),
  v.minLength(1, "name is required"),
  v.maxLength(120, "name is at most 120 characters"),
);

export const createTourSchema = v.object({
  name: tourNameSchema,
  tour: v.optional(storedTourSchema),
});

export const patchTourSchema = v.object({
  version: v.pipe(v.number("version is required (the version you edited)"), v.integer(), v.minValue(1)),
  name: v.optional(tourNameSchema),
  tour: v.optional(storedTourSchema),
  note: v.optional(v.pipe(v.string(), v.trim(), v.maxLength(2000))),
  /** Overwrite a newer version (allowed to the lead and the tour's owner only). */
  overwrite: v.optional(v.boolean()),
});

export const tourListQuerySchema = v.object({
  status: v.optional(v.picklist(["draft", "in_review", "returned", "baselined"], "status must be draft, in_review, returned or baselined")),
  q: v.optional(v.pipe(v.string(), v.maxLength(120))),
  owner: v.optional(v.pipe(v.string(), v.regex(/^\d{1,10}$/, "owner must be a user id"))),
  body: v.optional(v.pipe(v.string(), v.maxLength(60))),
  sort: v.optional(
    v.picklist(
      ["name", "owner", "status", "updated", "launch", "c3", "dv", "tof", "arrivalVinf", "margin"],
      "unknown sort key",
    ),
  ),
  dir: v.optional(v.picklist(["asc", "desc"], "dir must be asc or desc")),
  dvMin: v.optional(v.pipe(v.string(), v.regex(/^\d+(\.\d+)?$/, "dvMin must be a number (km/s)"))),
  dvMax: v.optional(v.pipe(v.string(), v.regex(/^\d+(\.\d+)?$/, "dvMax must be a number (km/s)"))),
  c3Min: v.optional(v.pipe(v.string(), v.regex(/^\d+(\.\d+)?$/, "c3Min must be a number (km²/s²)"))),
  c3Max: v.optional(v.pipe(v.string(), v.regex(/^\d+(\.\d+)?$/, "c3Max must be a number (km²/s²)"))),
  limit: v.optional(v.pipe(v.string(), v.regex(/^\d{1,3}$/, "limit must be 1–500"))),
  offset: v.optional(v.pipe(v.string(), v.regex(/^\d{1,6}$/, "offset must be a whole number"))),
});

/** A fresh tour: Earth → Mars over the 2028–29 opportunity (TDB seconds past J2000). */
export function defaultStoredTour(): StoredTour {
  const day = 86400;
  const launch = (10350 - 0.5) * day; // MJD2000 10350 ≈ 2028-05-05
  return {
    formatVersion: 1,
    ephemeris: { kind: "vsop", cached: true },
    nodes: [
      { id: "n1", body: "earth", epoch: launch, window: { start: launch - 60 * day, end: launch + 60 * day } },
      { id: "n2", body: "mars", epoch: launch + 230 * day, window: { start: launch + 150 * day, end: launch + 330 * day } },
    ],
    legs: [{ revs: 0, prograde: true }],
    arrival: { kind: "rendezvous" },
    rpMin: {},
    aim: {},
  };
}
