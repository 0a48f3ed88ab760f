import type { NextConfig } from "next";
import { buildSettings } from "./lib/env";

const settings = buildSettings(process.env);

// Security headers for every route. Scripts need 'unsafe-inline' because statically generated
// pages (lessons, the Bench) can't carry a per-request nonce; everything else is locked to 'self'.
const csp = [
  "default-src 'self'",
  // React's dev build needs eval for its debugging aids; production never does.
  settings.NODE_ENV === "production" ? "script-src 'self' 'unsafe-inline'" : "script-src 'self' 'unsafe-inline' 'unsafe-eval'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join("; ");

const nextConfig: NextConfig = {
  distDir: settings.NEXT_DIST_DIR,
  poweredByHeader: false,
  // Served directly (the demo) Next compresses; behind the reverse proxy (npm run start:cluster)
  // nginx compresses and Next must not (Next.js self-hosting guide).
  compress: settings.COMPRESSION_BY_PROXY !== "true",
  reactStrictMode: true,
  typedRoutes: false,
  experimental: { authInterrupts: true },
  serverExternalPackages: ["@node-rs/argon2", "smtp-server", "mailparser"],
  async headers() {
    return [
      {
        source: "/:path*",
        headers: [
          { key: "Content-Security-Policy", value: csp },
          { key: "X-Content-Type-Options", value: "nosniff" },
          { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
          { key: "X-Frame-Options", value: "DENY" },
          { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
        ],
      },
    ];
  },
};

export default nextConfig;
