import { describe, expect, it } from "vitest";
import { feetToMetres, patternLevelDb, PICKUP_PATTERNS } from "@/lib/acoustics";
import { DirectBoxFigure } from "@/components/figures/direct-box-figure";
import { DistanceLevelFigure } from "@/components/figures/distance-level-figure";
import { FeedbackMarginFigure } from "@/components/figures/feedback-margin-figure";
import { Figure } from "@/components/figures/figure";
import { GainStructureFigure } from "@/components/figures/gain-structure-figure";
import { NoiseDoseFigure } from "@/components/figures/noise-dose-figure";
import { PhantomPowerFigure } from "@/components/figures/phantom-power-figure";
import { PickupPatternFigure } from "@/components/figures/pickup-pattern/pickup-pattern-figure";
import { ProximityFigure } from "@/components/figures/proximity-figure";
import { TwoMicsFigure } from "@/components/figures/two-mics-figure";
import { imageLabel, markup, numberIn, textOf } from "./markup";

/* Each figure rendered on the server in a starting state; its readouts are checked against
   published values (tests/sources.md) within the display rounding. */

function readout(html: string, testId: string): number {
  return numberIn(textOf(html, testId));
}

describe("pickup-pattern figure", () => {
  it("puts the wedge in a cardioid's rear null and the 90° cymbal 6 dB down", () => {
    const html = markup(<PickupPatternFigure pattern="cardioid" initialState={{ cymbalDeg: 90 }} />);
    // Eargle, The Microphone Book, Table 6-1 / HyperPhysics: cardioid null at 180°, −6 dB at 90°.
    expect(readout(html, "source-level-wedge")).toBe(-Infinity);
    expect(readout(html, "source-level-cymbal")).toBeCloseTo(-6.0, 1);
    expect(readout(html, "source-level-voice")).toBe(0);
    // Eargle Table 6-1: DI 4.8 dB, RE 0.33 [pub, 2 s.f.]; derived DI 4.771 dB.
    expect(readout(html, "figure-di")).toBeCloseTo(4.77, 2);
    expect(readout(html, "figure-ree")).toBeCloseTo(0.333, 3);
    // HyperPhysics pickup arcs [pub, integer degrees]: cardioid 131° (−3 dB), 180° (−6 dB).
    expect(readout(html, "figure-arc3")).toBe(131);
    expect(readout(html, "figure-arc6")).toBe(180);
  });

  it("shows the supercardioid's figures and its nulls in the text alternative", () => {
    const html = markup(<PickupPatternFigure pattern="supercardioid" />);
    // [derived] from Heller (2011) exact A: DI 5.719 dB, null 125.26°, 90° −8.730 dB, 180° −11.439 dB.
    expect(readout(html, "figure-di")).toBeCloseTo(5.72, 2);
    expect(textOf(html, "figure-nulls")).toBe("125.3°, 234.7°");
    expect(readout(html, "figure-90")).toBeCloseTo(-8.73, 2);
    expect(readout(html, "figure-180")).toBeCloseTo(-11.44, 2);
    expect(textOf(html, "figure-180")).toContain("inverted");
    // HyperPhysics [pub]: supercardioid F/B (hemispherical) 11.4 dB; derived 11.439.
    expect(readout(html, "figure-fb")).toBeCloseTo(11.44, 2);
    const label = imageLabel(html, "Polar plot");
    expect(label).toContain("supercardioid");
    expect(label).toContain("Nulls at 125° and 235°");
  });

  it("reads a hypercardioid's rear lobe: 180° at −6.02 dB, null near 110°", () => {
    const html = markup(<PickupPatternFigure initialState={{ pattern: "hypercardioid", a: PICKUP_PATTERNS.hypercardioid.a, wedgeDeg: 180 }} />);
    // HyperPhysics [pub]: hypercardioid 180° −6 dB, null 110°; Eargle Table 6-1 DI 6.0 dB.
    expect(readout(html, "source-level-wedge")).toBeCloseTo(-6.0, 1);
    expect(readout(html, "figure-nulls")).toBeCloseTo(109.5, 1);
    expect(readout(html, "figure-di")).toBeCloseTo(6.02, 2);
  });

  it("matches the library for a custom A, and says so in the live sentence", () => {
    const html = markup(<PickupPatternFigure initialState={{ pattern: "custom", a: 0.42, wedgeDeg: 150 }} />);
    expect(readout(html, "source-level-wedge")).toBeCloseTo(patternLevelDb({ a: 0.42, angleDeg: 150 }), 1);
    expect(textOf(html, "pattern-key-result")).toContain("Custom pattern (A = 0.42)");
    expect(html).toContain('aria-live="polite"');
  });

  it("ignores an unknown lesson pattern and starts as a cardioid", () => {
    expect(textOf(markup(<PickupPatternFigure pattern="banana" />), "pattern-key-result")).toMatch(/^Cardioid/);
  });
});

describe("proximity figure", () => {
  it("gives the ideal cardioid boost at 5 cm, 100 Hz", () => {
    const html = markup(<ProximityFigure distanceM={0.05} />);
    // Proximity model 10·log10(1 + (B/kr)²) [derived]: cardioid, 5 cm, 100 Hz, c = 343.0 m/s → 14.886 dB; our c at 20 °C is
    // 343.2 m/s, which adds under 0.006 dB.
    expect(readout(html, "boost-100hz")).toBeCloseTo(14.89, 1);
    // Same row: figure-8 20.799 dB, hypercardioid 18.328 dB.
    expect(readout(html, "boost-100hz-figure8")).toBeCloseTo(20.8, 1);
    expect(readout(html, "boost-100hz-hypercardioid")).toBeCloseTo(18.3, 1);
    expect(readout(html, "boost-100hz-omni")).toBe(0);
  });

  it("places the figure-8's 3 dB point at c/(2πr)", () => {
    const html = markup(<ProximityFigure initialState={{ pattern: "figure8", distanceM: 0.3 }} />);
    // Proximity model: figure-8 boost is 3 dB at kr = 1, f = c/(2πr) = 343.2/(2π·0.3) ≈ 182 Hz [derived].
    expect(readout(html, "corner-hz")).toBeCloseTo(182, 0);
    // Proximity model [derived]: figure-8 at 30 cm, 100 Hz → 6.346 dB.
    expect(readout(html, "boost-100hz")).toBeCloseTo(6.35, 1);
  });
});

describe("two-mics figure", () => {
  it("shows the ripple that 3:1 still leaves", () => {
    const html = markup(<TwoMicsFigure nearM={0.3} farM={0.9} />);
    // Inverse-square law (Ballou ch. 34): a third of the distance is 20·log10(1/3) = −9.54 dB [derived].
    expect(readout(html, "level-difference")).toBeCloseTo(-9.54, 2);
    // |H| extremes 20·log10(1 ± 1/3) = +2.50 / −3.52 dB (recordingology comb formula) [derived].
    expect(readout(html, "comb-peak")).toBeCloseTo(2.5, 2);
    expect(readout(html, "comb-dip")).toBeCloseTo(-3.52, 2);
    // t = d/c: 1 m takes 2.9138 ms at 343.2 m/s, so 0.6 m takes 1.748 ms.
    expect(readout(html, "delay-ms")).toBeCloseTo(1.748, 2);
    // First notch c/(2Δd) = 343.2/1.2 ≈ 286 Hz (Everest & Pohlmann) [derived].
    expect(textOf(html, "notch-list")).toMatch(/^286 Hz, 858 Hz/);
    expect(textOf(html, "three-to-one")).toContain("You are at 3:1");
    expect(textOf(html, "three-to-one")).toContain("+2.5 dB / −3.5 dB");
  });

  it("swaps a lesson's distances given the wrong way round", () => {
    const html = markup(<TwoMicsFigure nearM={0.9} farM={0.3} />);
    expect(readout(html, "distance-ratio")).toBeCloseTo(3, 2);
  });
});

describe("distance-level figure", () => {
  it("drops 6.02 dB per doubling and finds the distance for a change", () => {
    const html = markup(<DistanceLevelFigure initialState={{ referenceLevelDb: 100, referenceM: 1, distanceM: 2, changeDb: -6 }} />);
    // Inverse-square law: doubling the distance → −6.021 dB (Ballou, Handbook for Sound Engineers, ch. 34).
    expect(readout(html, "level-at-distance")).toBeCloseTo(93.98, 2);
    expect(readout(html, "change-from-reference")).toBeCloseTo(-6.02, 2);
    // −6 dB from 2 m: 2·10^(6/20) = 3.99 m [derived].
    expect(readout(html, "distance-for-change")).toBeCloseTo(3.99, 2);
  });
});

describe("direct-box figure", () => {
  it("reflects a 1.5 kΩ preamp through 12:1 as 216 kΩ", () => {
    const html = markup(<DirectBoxFigure initialState={{ turnsRatio: 12, preampInputOhms: 1500, sourceLevelDbu: -10 }} />);
    // Ideal transformer Z_p = N²·Z_s (Ballou, audio transformers): 144 × 1.5 kΩ = 216 kΩ; −20·log10 12 = −21.58 dB [derived].
    expect(textOf(html, "reflected-load")).toBe("216 kΩ");
    expect(readout(html, "di-voltage-change")).toBeCloseTo(-21.58, 2);
    expect(readout(html, "level-at-preamp")).toBeCloseTo(-31.58, 2);
    expect(textOf(html, "impedance-ratio")).toBe("144 : 1");
  });

  it("always carries the mains-earth caution", () => {
    const html = markup(<DirectBoxFigure initialState={{ groundLift: true }} />);
    expect(html).toContain("never lift the mains safety earth");
    expect(imageLabel(html, "An instrument")).toContain("Ground lift on");
  });
});

describe("phantom-power figure", () => {
  it("leaves 30.98 V at a mic drawing 5 mA from P48", () => {
    const html = markup(<PhantomPowerFigure />);
    // IEC 61938 P48: 6.81 kΩ per leg, so V − I·R/2 = 48 − 0.005·3405 = 30.98 V [derived]; 7.05 mA one leg shorted.
    expect(readout(html, "volts-at-mic")).toBeCloseTo(30.98, 2);
    expect(textOf(html, "phantom-spec")).toBe("Within IEC 61938");
    expect(readout(html, "fault-one-leg")).toBeCloseTo(7.05, 2);
    expect(html).toContain("ribbons and unbalanced sources");
  });

  it("is out of spec above 10 mA or outside 48 ± 4 V, and impossible beyond the short-circuit current", () => {
    // Sound On Sound glossary "Phantom Power": P48 44–52 V, 10 mA maximum [pub].
    expect(textOf(markup(<PhantomPowerFigure initialState={{ currentMa: 11 }} />), "phantom-spec")).toBe("Out of spec");
    expect(textOf(markup(<PhantomPowerFigure initialState={{ supplyV: 42 }} />), "phantom-spec")).toBe("Out of spec");
    // 48 V into R/2 = 3405 Ω can push at most 14.1 mA [derived].
    expect(textOf(markup(<PhantomPowerFigure initialState={{ currentMa: 15 }} />), "volts-at-mic")).toBe("—");
  });
});

describe("feedback-margin figure", () => {
  it("reproduces the handbook's indoor example", () => {
    const html = markup(<FeedbackMarginFigure />);
    // Ballou, Handbook for Sound Engineers, 4th ed., eqs. 34-21/34-22: PAG 11.7 dB, NAG 17.7 dB [pub, 3 s.f.].
    expect(readout(html, "pag")).toBeCloseTo(11.65, 1);
    expect(readout(html, "nag")).toBeCloseTo(17.66, 1);
    expect(readout(html, "feedback-margin")).toBeLessThan(0);
    expect(textOf(html, "feedback-margin")).toContain("short");
  });

  it("reproduces the outdoor form, in feet or metres alike", () => {
    const html = markup(<FeedbackMarginFigure initialState={{ room: "outdoor" }} />);
    // Same handbook, eqs. 34-5 and 34-8 with the book's inputs: PAG 19.33 dB, NAG 30.10 dB [derived].
    expect(readout(html, "pag")).toBeCloseTo(19.33, 2);
    expect(readout(html, "nag")).toBeCloseTo(30.1, 2);
    expect(html).toContain(`${(feetToMetres(128)).toFixed(1)} m`);
  });
});

describe("noise-dose figure", () => {
  it("gives the published NIOSH example", () => {
    const html = markup(<NoiseDoseFigure initialState={{ segments: [{ levelDba: 100, hours: 5 / 60 }, { levelDba: 94, hours: 0.5 }], nextLevelDba: 94 }} />);
    // NIOSH 98-126 formula; Engineering ToolBox example: 5 min @ 100 + 30 min @ 94 dBA → 83.3 %, TWA 84.2 dBA [pub].
    expect(readout(html, "dose-niosh")).toBeCloseTo(83.3, 1);
    expect(readout(html, "twa-niosh")).toBeCloseTo(84.2, 1);
    // Time left at 94 dBA (NIOSH T = 1 h): (1 − 0.833)·1 h = 10 min [derived].
    expect(textOf(html, "time-left-niosh")).toBe("10 min");
    expect(html).toContain("protect your hearing");
  });

  it("gives the published OSHA example", () => {
    const html = markup(<NoiseDoseFigure initialState={{ segments: [{ levelDba: 92, hours: 8 }] }} />);
    // 29 CFR 1910.95 App. A: 8 h at 92 dBA → 131.95 % (T = 6.06 h), TWA 92.0 dBA [pub].
    expect(readout(html, "dose-osha")).toBeCloseTo(132.0, 1);
    expect(readout(html, "twa-osha")).toBeCloseTo(92.0, 1);
    expect(textOf(html, "time-left-osha")).toBe("none (over the limit)");
  });
});

describe("gain-structure figure", () => {
  it("shows the EBU R68 and SMPTE RP 155 alignments: the same dBu reads 6 dB apart in dBFS", () => {
    // 2 mV/Pa at 100 dB SPL: −45.74 dBu (ISO 1683, ITU-R V.574) [derived]; +46 dB → +0.26 dBu
    const ebu = markup(<GainStructureFigure />);
    expect(readout(ebu, "level-dbu-mic")).toBeCloseTo(-45.7, 1);
    expect(readout(ebu, "level-dbu-converter")).toBeCloseTo(0.3, 1);
    // EBU R68-2000: 0 dBu = −18 dBFS, full scale +18 dBu [pub] → +0.26 dBu reads −17.7 dBFS
    expect(readout(ebu, "level-dbfs-converter")).toBeCloseTo(-17.7, 1);
    expect(textOf(ebu, "full-scale")).toBe("0 dBFS = 18.0 dBu");
    expect(readout(ebu, "headroom-converter")).toBeCloseTo(17.7, 1);
    const smpte = markup(<GainStructureFigure initialState={{ alignment: "smpte-rp155" }} />);
    // SMPTE RP 155: −20 dBFS reference, with +4 dBu (common practice): full scale +24 dBu
    expect(readout(smpte, "level-dbfs-converter")).toBeCloseTo(-23.7, 1);
    expect(textOf(smpte, "full-scale")).toBe("0 dBFS = 24.0 dBu");
  });

  it("gives the mic's thermal floor, the noise figure, and says where the chain clips", () => {
    const html = markup(<GainStructureFigure initialState={{ splDb: 135, mvPerPa: 20, preampGainDb: 20 }} />);
    // 150 Ω over 20 kHz at 290 K: the trade's −131 dBu (common practice); −130.96 [derived]
    expect(readout(html, "source-noise")).toBeCloseTo(-131.0, 1);
    // EIN −127 dBu − (−130.96) = 3.96 dB [derived]
    expect(readout(html, "noise-figure")).toBeCloseTo(4.0, 1);
    // 20 mV/Pa at 135 dB SPL = +9.26 dBu; +20 dB → +29.26 dBu, 5.26 dB over the preamp's +24 [derived]
    expect(textOf(html, "headroom-preamp")).toBe("−5.3 (clips)");
    expect(textOf(html, "gain-structure-key-result")).toContain("Preamp clips");
    expect(imageLabel(html, "A 20.0 mV/Pa mic")).toContain("Converter");
    const padded = markup(<GainStructureFigure initialState={{ splDb: 135, mvPerPa: 20, preampGainDb: 20, pad: true }} />);
    expect(readout(padded, "headroom-preamp")).toBeCloseTo(14.7, 1);
  });
});

describe("<Figure>", () => {
  it("shows a visible error box for an unknown name instead of throwing", () => {
    const html = markup(<Figure name="polar-pattern" />);
    expect(textOf(html, "figure-error")).toContain("Figure not found: “polar-pattern”");
  });
});
