/**
 * Public surface of the computation core (pure TypeScript; km, s, km/s, km³/s², rad;
 * epochs in TDB seconds past J2000; heliocentric frame ecliptic J2000).
 * Each module lists its sources in its own JSDoc.
 */
export * from "./types";
export * from "./constants";
export * from "./time";
export * from "./vec3";
export * from "./kepler";
export * from "./flyby";
export * from "./bplane";
export * from "./tour";
export * from "./lambert";
export * from "./frames";
export * from "./ephemeris";
export * from "./anomaly";
export * from "./sample";
export * from "./search";
