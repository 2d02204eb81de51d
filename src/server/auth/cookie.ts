import "server-only";
import { cookieSecure } from "@/env";

// The `__Host-` prefix makes the browser insist on Secure, Path=/ and no Domain (ASVS 4.0.3 V3.4.4,
// web-anchors A1); it is only usable over HTTPS, so plain-HTTP development uses the bare name.
export const SESSION_COOKIE_NAME = cookieSecure ? "__Host-borewise_session" : "borewise_session";

/** Both names, for the proxy's presence check (it does not care which one the build uses). */
export const SESSION_COOKIE_NAMES = ["__Host-borewise_session", "borewise_session"] as const;
