// Content-Security-Policy with a per-request nonce: Next.js reads the nonce
// from the request's CSP header and puts it on the scripts it renders, so no
// inline script runs without it. Development needs 'unsafe-eval' for React's
// debugging tools; production does not get it.
export function contentSecurityPolicy(nonce: string, isDev: boolean): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${isDev ? " 'unsafe-eval'" : ""}`,
    // Tailwind ships a stylesheet, but React and next/font set a few style attributes.
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}
