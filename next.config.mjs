// Security headers for every route. Scripts need 'unsafe-inline' because statically generated
// pages (lessons, the Bench) can't carry a per-request nonce; everything else is locked to 'self'.
const csp = [
  "default-src 'self'",
  // React's dev build needs eval for its debugging aids; production never does.
  process.env.NODE_ENV === "production" ? "script-src 'self' 'unsafe-inline'" : "script-src 'self' 'unsafe-inline' 'unsafe-eval'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join("; ");

/** @type {import('next').NextConfig} */
const nextConfig = {
  // A separate build folder lets two builds (e.g. a helper's dev server and the test build) coexist.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  // Next.js hashes the whole HTML in JavaScript on every request to make an ETag: 0.52 ms for a
  // 115 KB lesson page on this machine, as much as the rest of serving it (npm run bench:lesson).
  // Static pages already carry Cache-Control with s-maxage for a cache in front; a browser's
  // revalidation gets the page again instead of a 304. Build assets keep their own validators.
  generateEtags: false,
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
