import { NextResponse, type NextRequest } from "next/server";
import { env } from "@/env";
import { contentSecurityPolicy, newNonce, securityHeaders } from "@/lib/security-headers";
import { databaseDown } from "@/server/db";
import { unavailablePage } from "@/server/http/unavailable-page";

// Runs on every request: security headers on every response (pages, API answers, errors, files), and
// a nonce the page's scripts carry. The session redirect is only a convenience: it proves nothing
// about the cookie; the (shop) layout, every server action and every route handler check the session,
// role and shop themselves.
const SESSION_COOKIE_NAMES = ["__Host-borewise_session", "borewise_session"];
const SHOP_PREFIXES = ["/jobs", "/plan", "/stones", "/machines", "/runs", "/floor", "/settings", "/quotes", "/invoices"];

const needsSession = (pathname: string) => SHOP_PREFIXES.some((p) => pathname === p || pathname.startsWith(`${p}/`));

// A page read (not an API route, a build file or a public file such as /sw.js): while MariaDB is down it
// gets the plain 503 page instead of a render that would fail as a 500. API routes keep their own 503s;
// server actions (POST) answer through their ActionResult.
const isPageRead = (request: NextRequest) =>
  (request.method === "GET" || request.method === "HEAD") && !/^\/(api|_next)\//.test(request.nextUrl.pathname) && !/\.[a-z0-9]+$/i.test(request.nextUrl.pathname);

function signInRedirect(request: NextRequest): NextResponse {
  const url = request.nextUrl.clone();
  url.pathname = "/sign-in";
  url.search = "";
  url.searchParams.set("next", `${request.nextUrl.pathname}${request.nextUrl.search}`.slice(0, 200));
  return NextResponse.redirect(url);
}

export async function proxy(request: NextRequest) {
  const nonce = newNonce();
  const csp = contentSecurityPolicy(nonce, { dev: env.NODE_ENV === "development" });
  let response: Response;
  if (isPageRead(request) && (await databaseDown())) {
    response = unavailablePage();
  } else if (needsSession(request.nextUrl.pathname) && !SESSION_COOKIE_NAMES.some((name) => request.cookies.has(name))) {
    response = signInRedirect(request);
  } else {
    // Next reads the nonce from the request's CSP header and puts it on the scripts it renders.
    const headers = new Headers(request.headers);
    headers.set("content-security-policy", csp);
    response = NextResponse.next({ request: { headers } });
  }
  const https = env.APP_URL.startsWith("https://") || request.nextUrl.protocol === "https:";
  for (const [name, value] of securityHeaders({ csp, https })) response.headers.set(name, value);
  return response;
}

export const config = { matcher: "/:path*" };
