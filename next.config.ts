import type { NextConfig } from "next";
import { buildSettings, uploadConnectSources } from "./lib/env";

const settings = buildSettings(process.env);

const https = settings.NEXTAUTH_URL?.startsWith("https://") ?? false;

// Security headers for every route. What 'unsafe-inline' remains, and why:
// - script-src: Next.js streams each page's data as inline <script> tags. A nonce would need every
//   page rendered per request (Next.js CSP guide), which would end static lessons and the proxy
//   cache; hashes can't be listed ahead for content that differs per page. No eval in production.
// - style-src: React writes style="" attributes (figure geometry, progress widths) and next/font
//   injects its @font-face rules inline.
// Everything else is 'self' or nothing.
const csp = [
  "default-src 'self'",
  // React's dev build needs eval for its debugging aids; production never does.
  settings.NODE_ENV === "production" ? "script-src 'self' 'unsafe-inline'" : "script-src 'self' 'unsafe-inline' 'unsafe-eval'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  // Photo uploads: the browser PUTs the bytes straight to the upload service's ingest (presigned URLs).
  ["connect-src 'self'", ...uploadConnectSources(process.env)].join(" "),
  "manifest-src 'self'",
  "media-src 'self'",
  "worker-src 'self'",
  "frame-src 'none'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
  ...(https ? ["upgrade-insecure-requests"] : []),
].join("; ");

/** The served photos' policy (lib/server/photo-response.ts sends the same). */
const PHOTO_CSP = "default-src 'none'; sandbox";

// HSTS only where the public URL is https (hosted): one year, as the OWASP HTTP Headers Cheat Sheet recommends.
const hsts = https ? [{ key: "Strict-Transport-Security", value: "max-age=31536000; includeSubDomains" }] : [];

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
          { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
          ...hsts,
        ],
      },
      // A placement photo opened on its own runs nothing and loads nothing (these config headers
      // replace a route handler's own, so the photo route's policy is set here, after the general one).
      { source: "/api/photos/:path*", headers: [{ key: "Content-Security-Policy", value: PHOTO_CSP }] },
    ];
  },
};

export default nextConfig;
