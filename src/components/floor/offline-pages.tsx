"use client";
import { useEffect } from "react";
import { usePathname } from "next/navigation";
import { FLOOR_PAGE_CACHE, FLOOR_SW_SCOPE, FLOOR_SW_URL, type FloorWorkerMessage } from "@/shared/floor/offline";

const supported = () => typeof navigator !== "undefined" && "serviceWorker" in navigator && window.isSecureContext;

/** Forgets the floor pages this device kept (sign-out, shop switch): the next person never sees them. */
export async function forgetFloorPages(): Promise<void> {
  try {
    if ("caches" in window) await window.caches.delete(FLOOR_PAGE_CACHE);
    navigator.serviceWorker?.controller?.postMessage({ type: "forget-pages" } satisfies FloorWorkerMessage);
  } catch {
    // A browser without Cache Storage kept nothing to forget.
  }
}

/**
 * Registers the floor's service worker (production builds only: `next dev` has no /sw.js) and asks it
 * to keep the page now shown, so a reload without a network still opens it.
 */
export function FloorOffline() {
  const pathname = usePathname();
  useEffect(() => {
    if (!supported() || process.env.NODE_ENV !== "production") return;
    navigator.serviceWorker.register(FLOOR_SW_URL, { scope: FLOOR_SW_SCOPE }).catch(() => undefined);
  }, []);
  useEffect(() => {
    if (!supported() || process.env.NODE_ENV !== "production") return;
    const url = window.location.pathname + window.location.search;
    void navigator.serviceWorker.ready.then((registration) => {
      registration.active?.postMessage({ type: "keep-page", url } satisfies FloorWorkerMessage);
    });
  }, [pathname]);
  return null;
}

/** On the sign-in page: whoever signed out (or lost the session), what a late request may still have kept goes too. */
export function ForgetFloorPages() {
  useEffect(() => {
    void forgetFloorPages();
  }, []);
  return null;
}
