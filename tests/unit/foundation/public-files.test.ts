import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { palette } from "@/lib/design/palette";
import { declaredSize, pngSize, WebManifest } from "../../support/web-files";

// public/: robots.txt, the web app manifest and its icons (served as-is by Next.js from public/).
const read = (path: string) => readFileSync(`public/${path.replace(/^\//, "")}`);

describe("public/manifest.webmanifest", () => {
  const manifest = WebManifest.parse(JSON.parse(read("manifest.webmanifest").toString("utf8")));

  it("names Axisline and uses our palette's colours", () => {
    expect(manifest.short_name).toBe("Axisline");
    expect(manifest.name).toMatch(/^Axisline\b/);
    expect(manifest.background_color).toBe(palette.light.surface);
    // The icon's tile colour (app/icon.svg) is the light theme's ink.
    expect(manifest.theme_color).toBe(palette.light.ink);
    expect(readFileSync("app/icon.svg", "utf8")).toContain(`fill="${palette.light.ink}"`);
  });

  it("lists icons whose files exist at the size they declare, with 192 and 512 px and a maskable one", () => {
    for (const icon of manifest.icons) {
      expect(pngSize(read(icon.src)), icon.src).toEqual(declaredSize(icon.sizes));
    }
    const sizes = manifest.icons.filter((i) => i.purpose === "any").map((i) => i.sizes);
    expect(sizes).toEqual(expect.arrayContaining(["192x192", "512x512"]));
    expect(manifest.icons.some((i) => i.purpose === "maskable")).toBe(true);
  });
});

describe("public/robots.txt", () => {
  const lines = read("robots.txt").toString("utf8").split("\n").map((l) => l.trim());

  it("allows the public site and keeps crawlers out of the API, the role areas, accounts and dev pages", () => {
    expect(lines).toContain("User-agent: *");
    expect(lines).toContain("Allow: /");
    const disallowed = lines.filter((l) => l.startsWith("Disallow:")).map((l) => l.slice("Disallow:".length).trim());
    expect(disallowed.sort()).toEqual(["/account", "/admin", "/api/", "/dev", "/learn", "/school", "/teach"]);
  });
});
