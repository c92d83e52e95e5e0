/** @type {import('next').NextConfig} */
const nextConfig = {
  // PGlite loads its WebAssembly and data files from its own package folder;
  // bundling it breaks those paths (every route 500s). The others are native
  // or Node-only and gain nothing from bundling.
  serverExternalPackages: [
    "@electric-sql/pglite",
    "@node-rs/argon2",
    "smtp-server",
    "mailparser",
    "nodemailer",
  ],
  // Without this `next dev` on 127.0.0.1 refuses the dev assets and pages never hydrate.
  allowedDevOrigins: ["127.0.0.1"],
  poweredByHeader: false,
  async headers() {
    // Headers every response gets; the page CSP itself (with its nonce) is set in proxy.ts.
    return [
      {
        source: "/:path*",
        headers: [
          { key: "X-Content-Type-Options", value: "nosniff" },
          { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
          { key: "X-Frame-Options", value: "DENY" },
          { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
        ],
      },
      {
        // JSON answers are never framed or run; the page CSP comes from proxy.ts with its nonce.
        source: "/api/:path*",
        headers: [
          { key: "Content-Security-Policy", value: "default-src 'none'; frame-ancestors 'none'" },
        ],
      },
    ];
  },
};

export default nextConfig;
