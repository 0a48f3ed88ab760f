import type { Metadata, Viewport } from "next";
import "./globals.css";
import { publicUrlAtBuild } from "@/lib/env";
import { fontVariables } from "@/lib/fonts";
import { SiteHeader } from "@/components/shell/site-header";
import { SiteFooter } from "@/components/shell/site-footer";

export const metadata: Metadata = {
  // Canonical and social URLs are absolute from here (relative ones are invalid for Lighthouse and crawlers).
  metadataBase: publicUrlAtBuild(),
  title: { default: "Axisline: training for live-sound technicians", template: "%s · Axisline" },
  description: "Learn to choose, place and cable microphones and direct boxes, set gain, keep feedback away and work safely on stage.",
  // public/manifest.webmanifest: name, colours from lib/design/palette.ts, icons drawn from app/icon.svg (scripts/draw-icons.ts).
  manifest: "/manifest.webmanifest",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1 };

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en" className={fontVariables}>
      <body className="flex min-h-screen flex-col overflow-x-clip bg-surface font-sans text-ink antialiased">
        <SiteHeader />
        <main id="main" className="mx-auto w-full min-w-0 max-w-6xl flex-1 px-4 py-8">
          {children}
        </main>
        <SiteFooter />
      </body>
    </html>
  );
}
