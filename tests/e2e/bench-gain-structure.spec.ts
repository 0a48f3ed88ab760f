// The gain-structure tool on the Bench: keyboard operation changes the readouts and the live
// sentence, the state round-trips through the URL, and the page works at 320 px and in dark mode.
// Expected numbers come from the same lib/acoustics chain the figure draws (gain-structure-chain.ts).
import { dbuToDbfs } from "@/lib/acoustics/alignment";
import { gainStructure } from "@/components/figures/gain-structure-chain";
import { GAIN_STRUCTURE_DEFAULTS, type GainStructureState } from "@/components/figures/gain-structure-state";
import { checkPage, expect, test, type Page } from "./page-check";

function numberFrom(text: string): number {
  const match = /[-+]?\d+(?:\.\d+)?/.exec(text.replace(/\u2212/g, "-"));
  if (!match) throw new Error(`no number in "${text}"`);
  return Number(match[0]);
}

async function readout(page: Page, testId: string): Promise<number> {
  return numberFrom((await page.getByTestId(testId).first().textContent()) ?? "");
}

async function figureReady(page: Page) {
  await expect(page.locator('figure[data-figure="gain-structure"]')).toHaveAttribute("data-hydrated", "true");
}

async function tabTo(page: Page, selector: string, maxPresses = 80) {
  for (let press = 0; press < maxPresses; press += 1) {
    await page.keyboard.press("Tab");
    if (await page.evaluate((wanted) => document.activeElement?.matches(wanted) ?? false, selector)) return;
  }
  throw new Error(`Tab never reached ${selector}`);
}

test("keyboard alone: more preamp gain and the other alignment change the readouts, the live sentence and the URL", async ({ page }) => {
  await page.goto("/bench/gain-structure");
  await figureReady(page);
  const before = gainStructure(GAIN_STRUCTURE_DEFAULTS);
  expect(await readout(page, "level-dbfs-converter")).toBeCloseTo(before.converter.levelDbfs, 1);
  const sentenceBefore = await page.getByTestId("gain-structure-key-result").textContent();

  // The gain slider steps 1 dB per arrow press: +46 → +49 dB.
  await tabTo(page, '[data-testid="preamp-gain"]');
  for (let press = 0; press < 3; press += 1) await page.keyboard.press("ArrowRight");
  await expect(page.getByTestId("preamp-gain")).toHaveValue("49");
  const louder: GainStructureState = { ...GAIN_STRUCTURE_DEFAULTS, preampGainDb: 49 };
  expect(await readout(page, "level-dbu-converter")).toBeCloseTo(gainStructure(louder).converter.levelDbu, 1);
  await expect(page.getByTestId("gain-structure-key-result")).not.toHaveText(sentenceBefore ?? "");

  // Arrow keys in the alignment radios: EBU R68 → SMPTE RP 155; the same dBu reads 6 dB lower.
  await tabTo(page, '[data-testid="alignment"] input[type="radio"]');
  await page.keyboard.press("ArrowRight");
  const smpte: GainStructureState = { ...louder, alignment: "smpte-rp155" };
  const expected = gainStructure(smpte).converter;
  expect(await readout(page, "level-dbfs-converter")).toBeCloseTo(expected.levelDbfs, 1);
  expect(expected.levelDbfs).toBeCloseTo(dbuToDbfs({ dbu: expected.levelDbu, alignment: "ebu-r68" }) - 6, 9); // EBU R68 vs SMPTE RP 155
  await expect(page.getByTestId("full-scale")).toHaveText("0 dBFS = 24.0 dBu");

  // The pad is a checkbox: Space toggles it.
  await tabTo(page, '[data-testid="pad"]');
  await page.keyboard.press("Space");
  await expect(page.getByTestId("pad")).toBeChecked();
  expect(await readout(page, "level-dbu-pad")).toBeCloseTo(gainStructure({ ...smpte, pad: true }).points[1].levelDbu, 1);

  // The state is in the address; a reload restores it.
  await expect(page).toHaveURL(/align=smpte-rp155/);
  await expect(page).toHaveURL(/gain=49/);
  await expect(page).toHaveURL(/pad=1/);
  await page.reload();
  await figureReady(page);
  await expect(page.getByTestId("preamp-gain")).toHaveValue("49");
  await expect(page.getByTestId("pad")).toBeChecked();
  expect(await readout(page, "level-dbfs-converter")).toBeCloseTo(gainStructure({ ...smpte, pad: true }).converter.levelDbfs, 1);
});

test("a shared link that clips the preamp says so; a bad value is reported and reset", async ({ page }) => {
  await page.goto("/bench/gain-structure?spl=135&sens=20&gain=20&pad=0&ein=-150");
  await figureReady(page);
  await expect(page.getByTestId("bench-rejected")).toContainText("ein");
  await expect(page.getByTestId("gain-structure-key-result")).toContainText("Preamp clips");
  await expect(page.getByTestId("headroom-preamp")).toContainText("(clips)");
  await expect(page.getByTestId("least-headroom")).toHaveText("clipping");
  await checkPage(page, "bench-gain-structure-clipping");
});

test("works at 320 px and in dark mode", async ({ page }) => {
  await page.emulateMedia({ colorScheme: "dark" });
  await page.goto("/bench/gain-structure");
  await figureReady(page);
  await checkPage(page, "bench-gain-structure-dark");
  await page.setViewportSize({ width: 320, height: 800 });
  await page.waitForTimeout(150);
  const overflowPx = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflowPx, "scrolls sideways at 320 px").toBeLessThanOrEqual(0);
  await expect(page.getByTestId("preamp-gain")).toBeVisible();
  const box = await page.getByTestId("preamp-gain").boundingBox();
  expect(box?.height ?? 0).toBeGreaterThanOrEqual(24); // WCAG 2.5.8 target size
  await page.screenshot({ path: "test-results/screenshots/bench-gain-structure-dark-320.png", fullPage: true });
});
