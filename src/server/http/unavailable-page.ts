import "server-only";
import { DATABASE_RETRY_AFTER_SECONDS } from "@/server/db/availability";

export const UNAVAILABLE_PAGE_MESSAGE = "The workshop database is not answering; your last change may or may not have been saved: check before repeating it.";

// Plain on purpose: it must render with nothing from the database or the build (no scripts, no fonts).
const HTML = `<!doctype html>
<html lang="en">
<head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>Database not answering</title>
<style>body{font:1.125rem/1.5 system-ui,sans-serif;max-width:40rem;margin:3rem auto;padding:0 1rem;color:#1a1a1a}a{display:inline-block;padding:.75rem 0;min-height:44px}</style></head>
<body><main><h1>Database not answering</h1><p>${UNAVAILABLE_PAGE_MESSAGE}</p>
<p>This page tries again by itself when reloaded; wait a few seconds.</p><p><a href="">Reload</a></p></main></body>
</html>`;

/** The answer to a page request while MariaDB is down: 503 with Retry-After, never Next's 500. */
export function unavailablePage(): Response {
  return new Response(HTML, {
    status: 503,
    headers: { "content-type": "text/html; charset=utf-8", "retry-after": String(DATABASE_RETRY_AFTER_SECONDS), "cache-control": "no-store" },
  });
}
