import { declaredSize, pngSize, WebManifest } from "../support/web-files";
import { apiContext } from "./helpers";
import { expect, test } from "./page-check";

// public/ as the server answers it: robots.txt, the web app manifest and each icon it lists.

test("robots.txt and the web app manifest are served, and the manifest's icons are PNGs of the declared size", async () => {
  const api = await apiContext();
  const robots = await api.get("/robots.txt");
  expect(robots.status()).toBe(200);
  expect(robots.headers()["content-type"]).toMatch(/^text\/plain/);
  expect(await robots.text()).toMatch(/^Disallow: \/api\/$/m);

  const res = await api.get("/manifest.webmanifest");
  expect(res.status()).toBe(200);
  expect(res.headers()["content-type"]).toMatch(/^application\/manifest\+json/);
  const manifest = WebManifest.parse(await res.json());
  for (const icon of manifest.icons) {
    const file = await api.get(icon.src);
    expect(file.status(), icon.src).toBe(200);
    expect(file.headers()["content-type"], icon.src).toBe("image/png");
    expect(pngSize(await file.body()), icon.src).toEqual(declaredSize(icon.sizes));
  }
  await api.dispose();
});

test("every page links the manifest, and the browser reads it without complaint", async ({ page }) => {
  await page.goto("/courses");
  await expect(page.locator('head link[rel="manifest"]')).toHaveAttribute("href", "/manifest.webmanifest");
  // Chromium fetches the manifest for a page that links it; a parse error would be a console error (the fixture fails on it).
  const manifest = await page.request.get("/manifest.webmanifest");
  expect(manifest.ok()).toBe(true);
});
