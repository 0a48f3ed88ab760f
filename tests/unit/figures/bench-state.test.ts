import { describe, expect, it } from "vitest";
import { feetToMetres, PICKUP_PATTERNS, SUPERCARDIOID_A } from "@/lib/acoustics";
import { benchQueryKeys, benchQueryString, parseBenchQuery, type BenchStates } from "@/components/figures/bench-state";
import { FIGURE_NAMES, type FigureName } from "@/components/figures/figure-names";
import {
  DIRECT_BOX_DEFAULTS,
  DISTANCE_LEVEL_DEFAULTS,
  FEEDBACK_MARGIN_DEFAULTS,
  NOISE_DOSE_DEFAULTS,
  PHANTOM_POWER_DEFAULTS,
  PICKUP_PATTERN_DEFAULTS,
  PROXIMITY_DEFAULTS,
  TWO_MICS_DEFAULTS,
} from "@/components/figures/figure-state";
import { GAIN_STRUCTURE_DEFAULTS } from "@/components/figures/gain-structure-state";

const DEFAULTS: { [Name in FigureName]: BenchStates[Name] } = {
  "pickup-pattern": PICKUP_PATTERN_DEFAULTS,
  proximity: PROXIMITY_DEFAULTS,
  "two-mics": TWO_MICS_DEFAULTS,
  "distance-level": DISTANCE_LEVEL_DEFAULTS,
  "direct-box": DIRECT_BOX_DEFAULTS,
  "phantom-power": PHANTOM_POWER_DEFAULTS,
  "feedback-margin": FEEDBACK_MARGIN_DEFAULTS,
  "noise-dose": NOISE_DOSE_DEFAULTS,
  "gain-structure": GAIN_STRUCTURE_DEFAULTS,
};

/** Numbers to six significant figures, the precision the URL keeps. */
function toSixFigures<Value>(value: Value): Value {
  return JSON.parse(JSON.stringify(value), (_key, entry) => (typeof entry === "number" ? Number(entry.toPrecision(6)) : entry));
}

/** Serialise, then parse back from a real URL, as a reload would. */
function roundTrip<Name extends FigureName>(tool: Name, state: BenchStates[Name]) {
  const url = new URL(`https://axisline.test/bench/${tool}?${benchQueryString(tool, state)}`);
  return parseBenchQuery(tool, url.searchParams);
}

// Samples chosen by hand: a custom pattern, imperial distances (exact feet in metres), edge values.
const SAMPLES: { [Name in FigureName]: BenchStates[Name] } = {
  "pickup-pattern": { pattern: "custom", a: 0.42, voiceDeg: 10, wedgeDeg: 135, cymbalDeg: 300 },
  proximity: { pattern: "figure8", distanceM: 0.01, temperatureC: -10 },
  "two-mics": { nearM: feetToMetres(1), farM: feetToMetres(3), temperatureC: 31 },
  "distance-level": { referenceLevelDb: 118, referenceM: 0.5, distanceM: 64, changeDb: 12 },
  "direct-box": { sourceLevelDbu: -24, sourceImpedanceOhms: 470_000, turnsRatio: 20, preampInputOhms: 2200, groundLift: true },
  "phantom-power": { supply: "P12", supplyV: 13.5, currentMa: 12.5 },
  "feedback-margin": { ...FEEDBACK_MARGIN_DEFAULTS, room: "outdoor", openMics: 1, dsM: 0.05 },
  "noise-dose": { segments: [{ levelDba: 100, hours: 5 / 60 }, { levelDba: 94, hours: 0.5 }], nextLevelDba: 101 },
  "gain-structure": { alignment: "smpte-rp155", splDb: 135, mvPerPa: 22, pad: true, preampGainDb: 10, einDbu: -129.5, channelFaderDb: -40, busFaderDb: 10 },
};

describe("Bench state in the URL", () => {
  it.each(FIGURE_NAMES)("round-trips the defaults of %s", (tool) => {
    const { state, rejectedKeys } = roundTrip(tool, DEFAULTS[tool]);
    expect(rejectedKeys).toEqual([]);
    expect(toSixFigures(state)).toEqual(toSixFigures(DEFAULTS[tool]));
  });

  it.each(FIGURE_NAMES)("round-trips a hand-picked state of %s", (tool) => {
    const { state, rejectedKeys } = roundTrip(tool, SAMPLES[tool]);
    expect(rejectedKeys).toEqual([]);
    // Six significant figures are kept in the URL (5/60 h = 0.0833333 h).
    expect(toSixFigures(state)).toEqual(toSixFigures(SAMPLES[tool]));
  });

  it("reads the example link of the brief", () => {
    const { state, rejectedKeys } = parseBenchQuery("pickup-pattern", new URLSearchParams("pattern=cardioid&wedge=180"));
    expect(rejectedKeys).toEqual([]);
    expect(state).toEqual({ pattern: "cardioid", a: 0.5, wedgeDeg: 180 });
  });

  it("takes A from the preset, not from a stray a=", () => {
    const { state } = parseBenchQuery("pickup-pattern", new URLSearchParams("pattern=supercardioid&a=0.9"));
    // Heller (2011): the supercardioid optimum A = (√3 − 1)/2.
    expect(state.a).toBe(SUPERCARDIOID_A);
  });

  it("names the preset when a bare a= matches one", () => {
    expect(parseBenchQuery("pickup-pattern", new URLSearchParams("a=0.25")).state.pattern).toBe("hypercardioid");
    expect(parseBenchQuery("pickup-pattern", new URLSearchParams("a=0.3")).state.pattern).toBe("custom");
  });

  it("accepts the record form of searchParams that Next.js pages receive", () => {
    const { state } = parseBenchQuery("two-mics", { near: "0.3", far: ["0.9", "2"], other: "x" });
    expect(state).toEqual({ nearM: 0.3, farM: 0.9 });
  });

  it.each([
    ["pickup-pattern", "pattern=banana", ["pattern"]],
    ["pickup-pattern", "wedge=360&voice=-5&cymbal=abc", ["voice", "wedge", "cymbal"]],
    ["pickup-pattern", "a=1.5", ["a"]],
    ["proximity", "distance=0&temp=Infinity", ["distance", "temp"]],
    ["proximity", "distance=&pattern=custom", ["pattern", "distance"]],
    ["two-mics", "near=NaN&far=6", ["near", "far"]],
    ["distance-level", "ref=200&change=0x10", ["ref", "change"]],
    ["direct-box", "ratio=0.5&lift=maybe", ["ratio", "lift"]],
    ["phantom-power", "supply=P96", ["supply"]],
    ["phantom-power", "supply=P12&volts=48", ["volts"]],
    ["feedback-margin", "nom=2.5&room=cave", ["nom", "room"]],
    ["noise-dose", "s=100:1,banana", ["s"]],
    ["noise-dose", "s=150:1", ["s"]],
    ["noise-dose", `s=${Array.from({ length: 9 }, () => "90:1").join(",")}`, ["s"]],
    ["gain-structure", "align=aes&gain=80&ein=-140&pad=yes", ["align", "pad", "gain", "ein"]],
  ] as const)("refuses bad values for %s: %s", (tool, query, rejected) => {
    const { state, rejectedKeys } = parseBenchQuery(tool, new URLSearchParams(query));
    expect(rejectedKeys).toEqual(rejected);
    for (const key of rejected) expect(Object.keys(state)).not.toContain(key);
  });

  it("keeps the good values beside a bad one", () => {
    const { state, rejectedKeys } = parseBenchQuery("pickup-pattern", new URLSearchParams("pattern=figure8&wedge=999&cymbal=90"));
    expect(rejectedKeys).toEqual(["wedge"]);
    expect(state).toEqual({ pattern: "figure8", a: PICKUP_PATTERNS.figure8.a, cymbalDeg: 90 });
  });

  it("gives a phantom supply its nominal voltage when none is in the link", () => {
    // IEC 61938 nominal voltages: P12 12 V, P24 24 V, P48 48 V.
    expect(parseBenchQuery("phantom-power", new URLSearchParams("supply=P24")).state.supplyV).toBe(24);
  });

  it("ignores keys it does not know and lists the keys it reads", () => {
    expect(parseBenchQuery("proximity", new URLSearchParams("utm=1")).state).toEqual({});
    expect(benchQueryKeys("pickup-pattern")).toEqual(["pattern", "a", "voice", "wedge", "cymbal"]);
  });

  it("writes SI values whatever the viewer's units (1 ft = 0.3048 m exactly, NIST SP 811)", () => {
    expect(benchQueryString("two-mics", { nearM: feetToMetres(1), farM: feetToMetres(3), temperatureC: 20 })).toBe("near=0.3048&far=0.9144&temp=20");
  });
});
