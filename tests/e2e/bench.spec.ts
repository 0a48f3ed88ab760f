import {
  inverseSquareChangeDb,
  neededAcousticGainDb,
  noiseDose,
  patternLevelDb,
  phantomAtMic,
  potentialAcousticGainDb,
  proximityBoostDb,
  reflectedImpedanceOhms,
  speedOfSoundMs,
  SUPERCARDIOID_A,
} from "@/lib/acoustics";
import { FIGURE_NAMES, type FigureName } from "@/components/figures/figure-names";
import {
  DIRECT_BOX_DEFAULTS,
  DISTANCE_LEVEL_DEFAULTS,
  FEEDBACK_MARGIN_DEFAULTS,
  FEEDBACK_STABILITY_MARGIN_DB,
  NOISE_DOSE_DEFAULTS,
  PHANTOM_POWER_DEFAULTS,
  PICKUP_PATTERN_DEFAULTS,
  PROXIMITY_DEFAULTS,
  TWO_MICS_DEFAULTS,
} from "@/components/figures/figure-state";
import { gainStructure } from "@/components/figures/gain-structure-chain";
import { GAIN_STRUCTURE_DEFAULTS } from "@/components/figures/gain-structure-state";
import { checkPage, expect, test, type Page } from "./page-check";

/** "−9.54 dB" → −9.54; "−∞ dB" → −Infinity. */
function numberFrom(text: string): number {
  const normalised = text.replace(/\u2212/g, "-");
  if (normalised.includes("-∞")) return -Infinity;
  const match = /[-+]?\d+(?:\.\d+)?/.exec(normalised);
  if (!match) throw new Error(`no number in "${text}"`);
  return Number(match[0]);
}

async function readout(page: Page, testId: string): Promise<number> {
  return numberFrom((await page.getByTestId(testId).first().textContent()) ?? "");
}

/** Waits until the figure has hydrated, so keys and clicks reach React. */
async function figureReady(page: Page, tool: FigureName) {
  await expect(page.locator(`figure[data-figure="${tool}"]`)).toHaveAttribute("data-hydrated", "true");
}

/** Presses Tab until the focused element matches `selector` (keyboard only, like a person would). */
async function tabTo(page: Page, selector: string, maxPresses = 80) {
  for (let press = 0; press < maxPresses; press += 1) {
    await page.keyboard.press("Tab");
    if (await page.evaluate((wanted) => document.activeElement?.matches(wanted) ?? false, selector)) return;
  }
  throw new Error(`Tab never reached ${selector}`);
}

const c20 = speedOfSoundMs({ temperatureC: 20 });

/** One key readout per tool at its defaults, with the library's value for it. */
const KEY_READOUTS: Record<FigureName, { testId: string; expected: number; digits: number }> = {
  "pickup-pattern": { testId: "source-level-cymbal", expected: patternLevelDb({ a: PICKUP_PATTERN_DEFAULTS.a, angleDeg: PICKUP_PATTERN_DEFAULTS.cymbalDeg }), digits: 1 },
  proximity: {
    testId: "boost-100hz",
    expected: proximityBoostDb({ a: 0.5, distanceM: PROXIMITY_DEFAULTS.distanceM, frequencyHz: 100, speedOfSoundMs: c20 }),
    digits: 2,
  },
  "two-mics": { testId: "level-difference", expected: inverseSquareChangeDb({ fromM: TWO_MICS_DEFAULTS.nearM, toM: TWO_MICS_DEFAULTS.farM }), digits: 2 },
  "distance-level": {
    testId: "level-at-distance",
    expected: DISTANCE_LEVEL_DEFAULTS.referenceLevelDb + inverseSquareChangeDb({ fromM: DISTANCE_LEVEL_DEFAULTS.referenceM, toM: DISTANCE_LEVEL_DEFAULTS.distanceM }),
    digits: 2,
  },
  "direct-box": { testId: "reflected-load", expected: reflectedImpedanceOhms({ turnsRatio: DIRECT_BOX_DEFAULTS.turnsRatio, loadOhms: DIRECT_BOX_DEFAULTS.preampInputOhms }) / 1000, digits: 0 },
  "phantom-power": { testId: "volts-at-mic", expected: phantomAtMic({ supply: PHANTOM_POWER_DEFAULTS.supply, currentMa: PHANTOM_POWER_DEFAULTS.currentMa }).voltsAtMic, digits: 2 },
  "feedback-margin": {
    testId: "feedback-margin",
    expected:
      potentialAcousticGainDb({ ...FEEDBACK_MARGIN_DEFAULTS, stabilityMarginDb: FEEDBACK_STABILITY_MARGIN_DB, criticalDistanceM: FEEDBACK_MARGIN_DEFAULTS.criticalDistanceM }) -
      neededAcousticGainDb({ d0M: FEEDBACK_MARGIN_DEFAULTS.d0M, eadM: FEEDBACK_MARGIN_DEFAULTS.eadM, criticalDistanceM: FEEDBACK_MARGIN_DEFAULTS.criticalDistanceM }),
    digits: 2,
  },
  "noise-dose": { testId: "dose-niosh", expected: noiseDose({ segments: NOISE_DOSE_DEFAULTS.segments, standard: "niosh" }).dosePercent, digits: 1 },
  "gain-structure": { testId: "level-dbfs-converter", expected: gainStructure(GAIN_STRUCTURE_DEFAULTS).converter.levelDbfs, digits: 1 },
};

test("the Bench lists every tool; screenshots and no axe violations", async ({ page }) => {
  await page.goto("/bench");
  await expect(page.getByRole("heading", { level: 1, name: "The Bench" })).toBeVisible();
  const links = page.getByRole("list", { name: "Tools" }).getByRole("link");
  await expect(links).toHaveCount(FIGURE_NAMES.length);
  for (const name of FIGURE_NAMES) await expect(page.locator(`a[href="/bench/${name}"]`)).toHaveCount(1);
  await checkPage(page, "bench-index");
});

for (const tool of FIGURE_NAMES) {
  test(`/bench/${tool}: the library's value, screenshots, no axe violations`, async ({ page }) => {
    await page.goto(`/bench/${tool}`);
    await figureReady(page, tool);
    await expect(page.locator(`figure[data-figure="${tool}"] svg[role="img"]`).first()).toHaveAttribute("aria-label", /.{20,}/);
    await expect(page.locator(`figure[data-figure="${tool}"] [aria-live="polite"]`).first()).toBeVisible();
    const { testId, expected, digits } = KEY_READOUTS[tool];
    expect(await readout(page, testId)).toBeCloseTo(expected, digits);
    await expect(page.getByTestId("bench-formula-source")).not.toBeEmpty();
    await checkPage(page, `bench-${tool}`);
  });
}

test("pickup pattern with the keyboard alone: change the pattern, move the wedge, and keep it in the URL", async ({ page }) => {
  await page.goto("/bench/pickup-pattern");
  await figureReady(page, "pickup-pattern");
  await expect(page.getByTestId("source-level-wedge")).toHaveText("−∞ dB");

  // Arrow keys in a radio group select the next option: cardioid → supercardioid.
  await tabTo(page, '[data-testid="pattern-choice"] input[type="radio"]');
  await page.keyboard.press("ArrowRight");
  await expect(page.getByTestId("pattern-key-result")).toContainText("Supercardioid");
  expect(await readout(page, "source-level-wedge")).toBeCloseTo(patternLevelDb({ a: SUPERCARDIOID_A, angleDeg: 180 }), 1);

  // The wedge bearing slider steps 5° per arrow press: 180° → 170°.
  await tabTo(page, '[data-testid="source-angle-wedge"]');
  await page.keyboard.press("ArrowLeft");
  await page.keyboard.press("ArrowLeft");
  await expect(page.getByTestId("source-angle-wedge")).toHaveValue("170");
  const wedgeDb = await readout(page, "source-level-wedge");
  expect(wedgeDb).toBeCloseTo(patternLevelDb({ a: SUPERCARDIOID_A, angleDeg: 170 }), 1);
  await expect(page.getByTestId("pattern-key-result")).toContainText(String(Math.abs(wedgeDb)));

  // The state is mirrored into the address; a reload restores it.
  await expect(page).toHaveURL(/pattern=supercardioid/);
  await expect(page).toHaveURL(/wedge=170/);
  await page.reload();
  await figureReady(page, "pickup-pattern");
  await expect(page.getByTestId("source-angle-wedge")).toHaveValue("170");
  expect(await readout(page, "source-level-wedge")).toBeCloseTo(wedgeDb, 1);
});

test("a shared link sets the figure, and bad values are reported and reset", async ({ page }) => {
  await page.goto("/bench/pickup-pattern?pattern=figure8&wedge=90&cymbal=999");
  await figureReady(page, "pickup-pattern");
  // A figure-8 has its null at 90° (Eargle, Table 6-1).
  await expect(page.getByTestId("source-level-wedge")).toHaveText("−∞ dB");
  await expect(page.getByTestId("bench-rejected")).toContainText("cymbal");
  expect(await readout(page, "source-level-cymbal")).toBeCloseTo(patternLevelDb({ a: 0, angleDeg: PICKUP_PATTERN_DEFAULTS.cymbalDeg }), 1);
});

test("the unit preference switches lengths to feet and is remembered", async ({ page }) => {
  await page.goto("/bench/two-mics?near=0.3048&far=0.9144");
  await figureReady(page, "two-mics");
  await page.getByRole("button", { name: /Imperial/ }).click();
  await expect(page.getByRole("button", { name: /Imperial/ })).toHaveAttribute("aria-pressed", "true");
  // 0.3048 m is exactly 1 ft (NIST SP 811).
  await expect(page.getByTestId("near-distance")).toHaveAttribute("aria-valuetext", "1.00 ft");
  await page.reload();
  await figureReady(page, "two-mics");
  await expect(page.getByTestId("far-distance")).toHaveAttribute("aria-valuetext", "3.00 ft");
  await page.getByRole("button", { name: /Metric/ }).click();
  await expect(page.getByTestId("far-distance")).toHaveAttribute("aria-valuetext", "0.91 m");
});

test("an unknown tool is a 404", async ({ page, browserProblems }) => {
  browserProblems.expectFailedRequest(404, "/bench/polar-plot", "the test opens a tool that does not exist");
  const response = await page.goto("/bench/polar-plot");
  expect(response?.status()).toBe(404);
});
