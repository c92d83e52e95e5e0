/** @type {import('next').NextConfig} */
const nextConfig = {
  // PGlite loads its WebAssembly and data files from its own package folder;
  // bundling it breaks those paths (every route 500s).
  serverExternalPackages: ["@electric-sql/pglite", "@node-rs/argon2", "smtp-server", "mailparser", "nodemailer"],
  // Without this `next dev` on 127.0.0.1 refuses the dev assets and pages never hydrate.
  allowedDevOrigins: ["127.0.0.1"],
  poweredByHeader: false,
};

export default nextConfig;
