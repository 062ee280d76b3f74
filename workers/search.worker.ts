/// <reference lib="webworker" />
/** The search Web Worker: window-scan blocks and tour-search islands off the main thread (comlink). */
import { expose } from "comlink";
import { searchApi } from "./search-api";

expose(searchApi);

export type { SearchApi } from "./search-api";
