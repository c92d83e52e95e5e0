import { NextResponse, type NextRequest } from "next/server";
import { SESSION_COOKIE } from "@/lib/auth/cookies";
import { contentSecurityPolicy } from "@/lib/security-headers";

const signedInOnly = [/^\/g(\/|$)/, /^\/gardens$/, /^\/account$/];

// Two jobs only: give every page a CSP nonce, and send signed-out visitors of
// signed-in pages to sign-in. It is not the security boundary: every page and
// route handler checks the session and role itself.
export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  if (signedInOnly.some((re) => re.test(pathname)) && !request.cookies.has(SESSION_COOKIE)) {
    const url = request.nextUrl.clone();
    url.pathname = "/sign-in";
    url.search = `?next=${encodeURIComponent(pathname + search)}`;
    return NextResponse.redirect(url);
  }
  const nonce = btoa(crypto.randomUUID());
  const csp = contentSecurityPolicy(nonce, process.env.NODE_ENV === "development");
  const headers = new Headers(request.headers);
  headers.set("x-nonce", nonce);
  headers.set("Content-Security-Policy", csp);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set("Content-Security-Policy", csp);
  return response;
}

export const config = {
  // Pages only: API routes answer JSON and static assets need no nonce.
  matcher: [{ source: "/((?!api|_next/static|_next/image|favicon.ico).*)" }],
};
