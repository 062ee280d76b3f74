/// <reference lib="webworker" />
/** The astro Web Worker: tour evaluation and trajectory sampling off the main thread (comlink). */
import { expose } from "comlink";
import { astroApi } from "./astro-api";

expose(astroApi);

export type { AstroApi } from "./astro-api";
