/// <reference lib="webworker" />
// The floor's service worker, bundled by `serwist build` (serwist.config.mjs) after `next build`.
// Precached: the build's static assets (the floor shell's JS and CSS). At run time: the floor pages
// the tablet visited, network first with a short timeout, so a fresh answer wins whenever the shop's
// Wi-Fi is there. Only GETs are ever cached: the send queue posts straight to the network.
import { CacheFirst, ExpirationPlugin, NetworkFirst, Serwist, type PrecacheEntry, type RouteHandlerCallback, type SerwistGlobalConfig, type SerwistPlugin } from "serwist";
import { FLOOR_ASSET_CACHE, FLOOR_NETWORK_TIMEOUT_S, FLOOR_PAGE_CACHE, isFloorPath, type FloorWorkerMessage } from "@/shared/floor/offline";
import { preferCachedOnServerError } from "./server-error-fallback";

declare global {
  interface WorkerGlobalScope extends SerwistGlobalConfig {
    __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
  }
}
declare const self: ServiceWorkerGlobalScope;

// A redirect means the session is gone (the proxy sends signed-out requests to /sign-in): keep
// nothing of the last person's pages, and never store the redirect or an error page as the floor page.
const signedInOnly: SerwistPlugin = {
  cacheWillUpdate: async ({ response }) => (response.ok && !response.redirected && response.type !== "opaqueredirect" ? response : null),
  fetchDidSucceed: async ({ response }) => {
    if (response.type === "opaqueredirect" || response.redirected) await caches.delete(FLOOR_PAGE_CACHE);
    return response;
  },
};

const floorPages = new NetworkFirst({
  cacheName: FLOOR_PAGE_CACHE,
  networkTimeoutSeconds: FLOOR_NETWORK_TIMEOUT_S,
  plugins: [signedInOnly, new ExpirationPlugin({ maxEntries: 80, maxAgeSeconds: 7 * 24 * 3600 })],
});

// NetworkFirst falls back to the cache only when the network fails; a database outage answers 503.
const floorPagesOrCopy: RouteHandlerCallback = async (options) =>
  preferCachedOnServerError(await floorPages.handle(options), async () => (await caches.open(FLOOR_PAGE_CACHE)).match(options.request));

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  skipWaiting: true,
  clientsClaim: true,
  runtimeCaching: [
    { matcher: ({ request, url, sameOrigin }) => sameOrigin && request.method === "GET" && isFloorPath(url.pathname), handler: floorPagesOrCopy },
    {
      matcher: ({ request, url, sameOrigin }) => sameOrigin && request.method === "GET" && url.pathname.startsWith("/_next/static/"),
      handler: new CacheFirst({ cacheName: FLOOR_ASSET_CACHE, plugins: [new ExpirationPlugin({ maxEntries: 200 })] }),
    },
  ],
});

// A page first opened before the worker took control, or reached by a client-side navigation (which
// fetches only its RSC payload), is fetched once more as a document so a reload offline finds it.
self.addEventListener("message", (event) => {
  const message = event.data as FloorWorkerMessage | null;
  if (message?.type === "forget-pages") event.waitUntil(caches.delete(FLOOR_PAGE_CACHE));
  if (message?.type === "keep-page") {
    const url = new URL(message.url, self.location.origin);
    if (url.origin !== self.location.origin || !isFloorPath(url.pathname)) return;
    event.waitUntil(floorPages.handle({ event, request: new Request(url.pathname + url.search, { credentials: "same-origin" }) }).catch(() => undefined));
  }
});

serwist.addEventListeners();
