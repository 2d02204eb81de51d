/** @type {import('next').NextConfig} */
const nextConfig = {
  poweredByHeader: false,
  reactStrictMode: true,
  // A separate build folder lets a second build (e.g. the e2e build) run beside a dev server.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  serverExternalPackages: ["@node-rs/argon2", "sharp", "mysql2", "pino"],
};

export default nextConfig;
