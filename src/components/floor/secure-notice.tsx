"use client";
import { useSyncExternalStore } from "react";

const noop = () => () => undefined;

/** On a plain-http address the browser runs no service worker (and no send lock): the floor says so, and where to go. */
export function SecureNotice() {
  const insecure = useSyncExternalStore(noop, () => !window.isSecureContext, () => false);
  if (!insecure) return null;
  return (
    <p className="mb-4 rounded-md border border-caution bg-caution-light px-3 py-2 text-lead text-caution" role="note" data-testid="insecure-notice">
      Offline work needs the secure address of Borewise (one starting with https://). On this address the pages do not open without
      the network; entries are still kept on this tablet and sent when it can. Ask whoever runs Borewise in the shop for the https address.
    </p>
  );
}
