import { env } from "@/env";

// Browsers and URL parsers drop tabs and newlines and read "\" as "/", so "/\t/evil.example" becomes
// "//evil.example" (WHATWG URL spec, "basic URL parser"). Anything unusual is refused outright, and
// what is left must still resolve to our own origin.
const UNSAFE = /[\u0000-\u001f\u007f\\]/;

/** The path to follow after sign-in: a same-origin path of ours, otherwise "/". */
export function safeNext(next: unknown, appUrl: string = env.APP_URL): string {
  if (typeof next !== "string" || next.length === 0 || next.length > 200) return "/";
  if (!next.startsWith("/") || next.startsWith("//") || UNSAFE.test(next)) return "/";
  const origin = new URL(appUrl).origin;
  let resolved: URL;
  try {
    resolved = new URL(next, origin);
  } catch {
    return "/";
  }
  if (resolved.origin !== origin) return "/";
  // Dot segments can fold into a leading "//" ("/.//evil.example"), which a browser reads as another host.
  const path = `${resolved.pathname}${resolved.search}${resolved.hash}`;
  return path.startsWith("//") ? "/" : path;
}
