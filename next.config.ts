import type { NextConfig } from "next";
import { securityHeaders } from "./lib/server/security-headers";

const nextConfig: NextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // Separate build folders let several dev servers share one checkout (NEXT_DIST_DIR=.next-x).
  distDir: process.env.NEXT_DIST_DIR || ".next",
  // pg and bcryptjs run on the server only; keep them out of the bundle.
  serverExternalPackages: ["pg"],
  // forbidden() and forbidden.tsx: a page refused to a signed-in reader answers HTTP 403.
  experimental: { authInterrupts: true },
  // Security headers and the content security policy on every response (lib/server/security-headers.ts).
  // Read when the server starts (next dev) or at build time (next build): build with the real NEXTAUTH_URL.
  async headers() {
    const headers = securityHeaders({
      development: process.env.NODE_ENV === "development",
      https: (process.env.NEXTAUTH_URL ?? "").startsWith("https://"),
    });
    return [{ source: "/:path*", headers }];
  },
};

export default nextConfig;
