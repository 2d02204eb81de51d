// What the floor's service worker (src/worker/floor-sw.ts) and the pages that talk to it agree on.
/** The worker controls only the floor pages; the office screens never run through it. */
export const FLOOR_SW_SCOPE = "/floor";
export const FLOOR_SW_URL = "/sw.js";
/** Floor pages (HTML and their RSC payloads) the tablet visited: signed-in data, cleared on sign-out. */
export const FLOOR_PAGE_CACHE = "borewise-floor-pages-v1";
/** Build assets fetched outside the precache list (hashed names, so they never change). */
export const FLOOR_ASSET_CACHE = "borewise-floor-assets-v1";
/** Seconds the worker waits for the network before it answers a floor page from the cache. */
export const FLOOR_NETWORK_TIMEOUT_S = 3;

export type FloorWorkerMessage = { type: "keep-page"; url: string } | { type: "forget-pages" };

export const isFloorPath = (pathname: string) => pathname === FLOOR_SW_SCOPE || pathname.startsWith(`${FLOOR_SW_SCOPE}/`);
