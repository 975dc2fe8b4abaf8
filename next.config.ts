import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // Separate build folders let several dev servers share one checkout (NEXT_DIST_DIR=.next-x).
  distDir: process.env.NEXT_DIST_DIR || ".next",
  // pg and bcryptjs run on the server only; keep them out of the bundle.
  serverExternalPackages: ["pg"],
};

export default nextConfig;
