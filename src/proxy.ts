import { NextResponse, type NextRequest } from "next/server";

// Only a convenience: a visitor without any session cookie is sent to sign-in before a shop page
// renders. It proves nothing about the cookie; the (shop) layout, every server action and every
// route handler check the session, role and shop themselves.
const SESSION_COOKIE_NAMES = ["__Host-borewise_session", "borewise_session"];

export function proxy(request: NextRequest) {
  if (SESSION_COOKIE_NAMES.some((name) => request.cookies.has(name))) return NextResponse.next();
  const url = request.nextUrl.clone();
  url.pathname = "/sign-in";
  url.search = "";
  url.searchParams.set("next", `${request.nextUrl.pathname}${request.nextUrl.search}`.slice(0, 200));
  return NextResponse.redirect(url);
}

export const config = {
  matcher: ["/jobs/:path*", "/plan/:path*", "/stones/:path*", "/machines/:path*", "/runs/:path*", "/floor/:path*", "/settings/:path*"],
};
