import { API_CSP, SECURITY_HEADERS } from "./lib/platform/security-headers.mjs";

/** @type {import('next').NextConfig} */
const nextConfig = {
  // A separate build folder lets a test build run beside a served build.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  reactStrictMode: true,
  serverExternalPackages: ["pg", "pg-boss", "smtp-server", "mailparser", "nodemailer"],
  async headers() {
    return [
      { source: "/:path*", headers: SECURITY_HEADERS },
      // Pages get their nonce CSP from proxy.ts; API routes (and the downloads they serve) this one.
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: API_CSP }] },
    ];
  },
};

export default nextConfig;
