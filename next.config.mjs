/** @type {import('next').NextConfig} */
const nextConfig = {
  // A separate build folder lets a test build run beside a served build.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  reactStrictMode: true,
  serverExternalPackages: ["pg", "pg-boss", "smtp-server", "mailparser", "nodemailer"],
};

export default nextConfig;
