import { describe, expect, it } from "vitest";
import {
  combExtremesDb,
  combNotchesHz,
  dbuToVolts,
  dbvToDbu,
  dbvToVolts,
  delayMs,
  HYPERCARDIOID_A,
  inverseSquareChangeDb,
  patternFigures,
  patternLevelDb,
  PHANTOM_SUPPLIES,
  phantomAtMic,
  PICKUP_PATTERNS,
  permissibleExposureHours,
  potentialAcousticGainDb,
  proximityBoostDb,
  speedOfSoundMs,
  SUPERCARDIOID_A,
  twoPathAmplitudeRatio,
  voltsToDbv,
} from "@/lib/acoustics";
import { expectQuoted, loadLessons } from "../../support/lesson-quotes";

// Every computed number quoted in the miking-the-band course, read from the lesson and checked
// against lib/acoustics (tests/support/lesson-quotes.ts); where a lesson states the inputs
// (distances, levels, angles), they are read from it too. Full citations: tests/sources.md.
// Lessons les-mtb-order-of-work, les-mtb-input-list and les-mtb-wireless quote no computed numbers.
//
// The lessons pin the speed of sound at 343 m/s ("at 343 m/s" in the prose); the values derived
// below use it (Wikipedia "Speed of sound": 343.2 m/s at 20 °C; the difference is below every
// printed digit here).

const lesson = await loadLessons();
const SPEED_OF_SOUND_MS = 343.0;

const CARDIOID_A = PICKUP_PATTERNS.cardioid.a;
/** The "3:5" supercardioid of HyperPhysics, "Directional Patterns of Microphones" (null 127°). */
const SUPERCARDIOID_3_TO_5_A = 0.375;
const P48 = PHANTOM_SUPPLIES.P48;

function firstNotchHz(pathDifferenceM: number): number {
  return combNotchesHz({ pathDifferenceM, speedOfSoundMs: SPEED_OF_SOUND_MS, count: 1 })[0];
}

function firstNullDeg(a: number): number {
  return patternFigures({ a }).nullAnglesDeg[0];
}

/** How far below the front a pattern is at an angle, dB (positive: "n dB down"). */
function dbDown(a: number, angleDeg: number): number {
  return -patternLevelDb({ a, angleDeg });
}

function cardioidProximityAt100HzDb(distanceM: number): number {
  return proximityBoostDb({ a: CARDIOID_A, distanceM, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS });
}

/** A reference free-field PAG geometry (metres) so that single changes can be compared. */
const REFERENCE_GAIN_GEOMETRY = { dsM: 0.05, d0M: 12, d1M: 1.5, d2M: 10, openMics: 1, stabilityMarginDb: 6 };

function pagChangeDb(change: Partial<typeof REFERENCE_GAIN_GEOMETRY>): number {
  return potentialAcousticGainDb({ ...REFERENCE_GAIN_GEOMETRY, ...change }) - potentialAcousticGainDb(REFERENCE_GAIN_GEOMETRY);
}

const CM = 0.01;

describe("lesson les-mtb-line-check", () => {
  const text = lesson("les-mtb-line-check");

  it("P48 as IEC 61938:2018 specifies it (through the Sound On Sound glossary and Wikipedia 'Phantom power')", () => {
    const [supply, tolerance, resistorKOhm, current] = text.quotes("IEC 61938 specifies {} V ± {} V through {} kΩ per leg for P48, with up to {} mA available");
    expectQuoted(P48.nominalV, supply);
    expectQuoted(P48.toleranceV, tolerance);
    expectQuoted(P48.feedResistorPerLegOhms / 1000, resistorKOhm);
    expectQuoted(P48.maxCurrentMa, current);
  });

  it("voltage at a condenser drawing 5 mA: V − I·R/2 = 48 − 0.005 × 3405 = 30.98 V (IEC 61938 feed network, derived)", () => {
    const [currentMa, supplyV, resistorKOhm, volts] = text.quotes("A condenser drawing {} mA from a {} V supply through {} kΩ per leg sees about {} V at its connector");
    expect(resistorKOhm.value).toBe(P48.feedResistorPerLegOhms / 1000);
    expectQuoted(phantomAtMic({ supply: "P48", supplyV: supplyV.value, currentMa: currentMa.value }).voltsAtMic, volts);
    const [summaryMa, summaryV] = text.quotes("A P48 condenser drawing {} mA sees about {} V, not 48 V");
    expectQuoted(phantomAtMic({ supply: "P48", supplyV: 48, currentMa: summaryMa.value }).voltsAtMic, summaryV);
  });
});

describe("lesson les-mtb-kick-snare-hihat", () => {
  const text = lesson("les-mtb-kick-snare-hihat");

  it("cardioid side rejection: 20·log10 0.5 = −6.02 dB at 90° (Eargle ch. 5; HyperPhysics prints −6)", () => {
    const [down, angle] = text.quotes("A cardioid has its null directly behind the capsule and is only about {} dB down at {}°");
    expectQuoted(dbDown(CARDIOID_A, angle.value), down);
    const [summaryDown, summaryAngle] = text.quotes("A cardioid is only about {} dB down at {}°, so side-on is not rejection");
    expectQuoted(dbDown(CARDIOID_A, summaryAngle.value), summaryDown);
  });

  it("supercardioid and hypercardioid nulls and rear level (Heller 2011: 125.26°, −11.44 dB; HyperPhysics 3:5: 127°; hypercardioid 109.47°)", () => {
    const [exactNull, threeToFiveNull] = text.quotes("the deepest rejection is not straight behind but roughly {}–{}° off axis");
    expectQuoted(firstNullDeg(SUPERCARDIOID_A), exactNull);
    expectQuoted(firstNullDeg(SUPERCARDIOID_3_TO_5_A), threeToFiveNull);
    expectQuoted(dbDown(SUPERCARDIOID_A, 180), text.quote("while directly behind it is only about {} dB down"));
    expectQuoted(firstNullDeg(HYPERCARDIOID_A), text.quote("A hypercardioid has its nulls at about {}°"));
  });
});

describe("lesson les-mtb-toms-overheads", () => {
  const text = lesson("les-mtb-toms-overheads");

  it("snare path mismatch between overheads: f1 = c/(2Δd) = 343/(2 × 0.1) = 1715 Hz (comb-filter notch formula, derived)", () => {
    const pathCm = text.value("If one overhead is only {} cm further from the snare than the other");
    expectQuoted(firstNotchHz(pathCm * CM), text.quote("the first cancellation falls at about {} Hz (at 343 m/s)"));
    const [summaryCm, summaryHz] = text.quotes("A {} cm mismatch to the snare puts a first mono notch near {} Hz");
    expectQuoted(firstNotchHz(summaryCm.value * CM), summaryHz);
  });

  it("kick arrival in the overheads: t = d/c = 1.3/343 s = 3.79 ms; f1 = 343/(2 × 1.3) = 131.9 Hz (derived)", () => {
    const [ms, pathM] = text.quotes("At 343 m/s, sound takes about {} ms to cover {} m");
    expectQuoted(delayMs({ distanceM: pathM.value, speedOfSoundMs: SPEED_OF_SOUND_MS }), ms);
    expectQuoted(firstNotchHz(pathM.value), text.quote("the first cancellation would fall at about {} Hz"));
    const [summaryM, summaryMs, summaryHz] = text.quotes("The kick reaches overheads {} m further away about {} ms late. At equal level that would notch near {} Hz");
    expectQuoted(delayMs({ distanceM: summaryM.value, speedOfSoundMs: SPEED_OF_SOUND_MS }), summaryMs);
    expectQuoted(firstNotchHz(summaryM.value), summaryHz);
  });
});

describe("lesson les-mtb-reduced-kit", () => {
  const text = lesson("les-mtb-reduced-kit");

  it("inverse-square law: ΔL = −20·log10(r2/r1), ×2 → −6.02 dB; 1.2 → 0.8 m → +3.52 dB (free-field point source, derived)", () => {
    expectQuoted(-inverseSquareChangeDb({ fromM: 1, toM: 2 }), text.quote("each doubling of distance costs about {} dB"));
    const [fromM, toM, gainDb] = text.quotes("Lowering the overhead from {} m to {} m above the snare raises the snare at the microphone by about {} dB");
    expectQuoted(inverseSquareChangeDb({ fromM: fromM.value, toM: toM.value }), gainDb);
    const [summaryFrom, summaryTo, summaryGain] = text.quotes("lowering it from {} m to {} m raises the snare about {} dB at the microphone");
    expectQuoted(inverseSquareChangeDb({ fromM: summaryFrom.value, toM: summaryTo.value }), summaryGain);
  });

  it("other sources change by their own distances: cymbals 0.8 → 0.4 m = +6.02 dB, kick beater 1.7 → 1.3 m = +2.33 dB (free-field point source, derived)", () => {
    const [aboveM, cymbalFromM, cymbalToM, cymbalDb] = text.quotes("With the hi-hat and cymbals about {} m above the snare head, their distance to the microphone falls from {} m to {} m, a rise of about {} dB");
    const [overheadFromM, overheadToM] = text.quotes("Lowering the overhead from {} m to {} m above the snare");
    // The cymbals sit straight below the microphone, so their distance is the overhead's height less theirs.
    expect(cymbalFromM.value).toBeCloseTo(overheadFromM.value - aboveM.value, 6);
    expect(cymbalToM.value).toBeCloseTo(overheadToM.value - aboveM.value, 6);
    expectQuoted(inverseSquareChangeDb({ fromM: cymbalFromM.value, toM: cymbalToM.value }), cymbalDb);
    const [belowM, kickFromM, kickToM, kickDb] = text.quotes("The kick's beater, about {} m below the snare head, goes from {} m to {} m, a rise of only about {} dB");
    expect(kickFromM.value).toBeCloseTo(overheadFromM.value + belowM.value, 6);
    expect(kickToM.value).toBeCloseTo(overheadToM.value + belowM.value, 6);
    expectQuoted(inverseSquareChangeDb({ fromM: kickFromM.value, toM: kickToM.value }), kickDb);
    // The claim the sentence makes: the nearer source gains more than the snare, the farther one less.
    expect(cymbalDb.value).toBeGreaterThan(inverseSquareChangeDb({ fromM: overheadFromM.value, toM: overheadToM.value }));
    expect(kickDb.value).toBeLessThan(inverseSquareChangeDb({ fromM: overheadFromM.value, toM: overheadToM.value }));
  });
});

describe("lesson les-mtb-bass-di-and-mic", () => {
  const text = lesson("les-mtb-bass-di-and-mic");

  it("delay and first notch for a microphone 30 cm from the cone: 0.3/343 s = 0.875 ms, f1 = 571.7 Hz (derived)", () => {
    const [distanceCm, ms] = text.quotes("With the capsule {} cm from the cone, that is about {} ms at 343 m/s");
    expectQuoted(delayMs({ distanceM: distanceCm.value * CM, speedOfSoundMs: SPEED_OF_SOUND_MS }), ms);
    expectQuoted(firstNotchHz(distanceCm.value * CM), text.quote("offset by 0.87 ms cancel completely at about {} Hz"));
    const [summaryCm, summaryMs, summaryHz] = text.quotes("A mic {} cm from the cone arrives about {} ms after the DI. At equal level the first notch is near {} Hz");
    expectQuoted(delayMs({ distanceM: summaryCm.value * CM, speedOfSoundMs: SPEED_OF_SOUND_MS }), summaryMs);
    expectQuoted(firstNotchHz(summaryCm.value * CM), summaryHz);
  });

  it("ripple with the microphone 6 dB below the DI: a = 0.5 → +3.52 / −6.02 dB (two-path sum, recordingology.com formula)", () => {
    const [belowDb, peak, notch] = text.quotes("If the microphone is {} dB below the DI (half the amplitude), the sum swings between about {} dB at the peaks and {} dB at the notches");
    // "half the amplitude": 20·log10 0.5 = −6.02 dB
    expectQuoted(-voltsToDbv(0.5), belowDb);
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio: 0.5 });
    expectQuoted(peakDb, peak);
    expectQuoted(notchDb, notch);
    const [summaryDown, summaryPeak, summaryNotch] = text.quotes("With the mic {} dB down, the ripple is about {} dB and {} dB");
    const summary = combExtremesDb({ amplitudeRatio: 10 ** (-summaryDown.value / 20) });
    expectQuoted(summary.peakDb, summaryPeak);
    expectQuoted(summary.notchDb, summaryNotch);
  });
});

describe("lesson les-mtb-guitar-cabinet", () => {
  const text = lesson("les-mtb-guitar-cabinet");

  it("ideal cardioid at 45°: 20·log10(0.5 + 0.5·cos 45°) = −1.375 dB (Eargle ch. 5 pattern formula, derived)", () => {
    const [angle, down] = text.quotes("a microphone turned {}° away from the source is only about {} dB down");
    expectQuoted(dbDown(CARDIOID_A, angle.value), down);
    const [summaryDown, summaryAngle] = text.quotes("An ideal cardioid is only about {} dB down at {}°");
    expectQuoted(dbDown(CARDIOID_A, summaryAngle.value), summaryDown);
  });

  it("ideal cardioid proximity boost at 100 Hz: 5 cm 14.89 dB, 30 cm 2.62 dB (spherical-wave particle velocity, Kinsler & Frey; derived at c = 343)", () => {
    const [boost5, cm5, boost30, cm30] = text.quotes("the boost at 100 Hz is about {} dB at {} cm and about {} dB at {} cm");
    expectQuoted(cardioidProximityAt100HzDb(cm5.value * CM), boost5);
    expectQuoted(cardioidProximityAt100HzDb(cm30.value * CM), boost30);
  });
});

describe("lesson les-mtb-keys", () => {
  const text = lesson("les-mtb-keys");

  it("consumer and professional line levels: −10 dBV = 0.316 V, +4 dBu = 1.228 V, 11.78 dB apart (ControlBooth; ITU-R BS.645-2 0 dBu = 0.775 V)", () => {
    expectQuoted(dbvToVolts(-10), text.quote("the consumer level of −10 dBV (about {} V)"));
    expectQuoted(dbuToVolts(4), text.quote("the professional level of +4 dBu (about {} V)"));
    expectQuoted(4 - dbvToDbu(-10), text.quote("which is about {} dB higher than −10 dBV"));
    const [pro, consumer, gap] = text.quotes("+4 dBu is about {} V and −10 dBV about {} V, about {} dB apart");
    expectQuoted(dbuToVolts(4), pro);
    expectQuoted(dbvToVolts(-10), consumer);
    expectQuoted(4 - dbvToDbu(-10), gap);
  });
});

describe("lesson les-mtb-vocal-mics", () => {
  const text = lesson("les-mtb-vocal-mics");

  it("pattern figures for wedge placement (Eargle Table 6-1; HyperPhysics; Heller 2011)", () => {
    const [down, angle] = text.quotes("a wide front, about {} dB down at {}°");
    expectQuoted(dbDown(CARDIOID_A, angle.value), down);
    expectQuoted(firstNullDeg(SUPERCARDIOID_A), text.quote("its deepest rejection at roughly {}° off axis"));
    expectQuoted(dbDown(SUPERCARDIOID_A, 180), text.quote("Directly behind, it is about {} dB down rather than silent"));
    expectQuoted(firstNullDeg(HYPERCARDIOID_A), text.quote("with nulls at about {}° and a larger rear lobe"));
    const [rearDown, rearAngle] = text.quotes("a larger rear lobe only about {} dB down at {}°");
    expectQuoted(dbDown(HYPERCARDIOID_A, rearAngle.value), rearDown);
  });

  it("ideal cardioid proximity boost at 100 Hz: 5 cm 14.89, 10 cm 9.27, 30 cm 2.62 dB (Kinsler & Frey spherical wave; derived at c = 343)", () => {
    const [b5, cm5, b10, cm10, b30, cm30] = text.quotes("the boost is about {} dB at {} cm, about {} dB at {} cm and about {} dB at {} cm");
    expectQuoted(cardioidProximityAt100HzDb(cm5.value * CM), b5);
    expectQuoted(cardioidProximityAt100HzDb(cm10.value * CM), b10);
    expectQuoted(cardioidProximityAt100HzDb(cm30.value * CM), b30);
    const [s5, sCm5, s30, sCm30] = text.quotes("(ideal cardioid, 100 Hz: about {} dB at {} cm, {} dB at {} cm)");
    expectQuoted(cardioidProximityAt100HzDb(sCm5.value * CM), s5);
    expectQuoted(cardioidProximityAt100HzDb(sCm30.value * CM), s30);
  });
});

describe("lesson les-mtb-piano-one-mic-pair", () => {
  const text = lesson("les-mtb-piano-one-mic-pair");

  it("first mono notch of a spaced pair: 343/(2 × 0.4) = 428.75 Hz (comb-filter notch formula, derived)", () => {
    const [pathM, hz] = text.quotes("equal copies offset by {} m first cancel at about {} Hz (at 343 m/s)");
    expectQuoted(firstNotchHz(pathM.value), hz);
    const [summaryM, summaryHz] = text.quotes("a {} m path difference puts the first mono notch near {} Hz");
    expectQuoted(firstNotchHz(summaryM.value), summaryHz);
  });
});

describe("lesson les-mtb-piano-boundary", () => {
  const text = lesson("les-mtb-piano-boundary");

  it("reflection notch 10 cm from the lid (0.2 m extra path: 857.5 Hz) and at a boundary capsule (1 cm: 17 150 Hz), derived", () => {
    const [pathM, hz] = text.quotes("gets a reflection that has travelled about {} m further, and the first cancellation falls near {} Hz (at 343 m/s)");
    // The lesson rounds to tens of hertz ("near 860 Hz").
    expectQuoted(firstNotchHz(pathM.value), hz, { step: 10 });
    const [pathCm, kHz] = text.quotes("A {} cm path difference puts the first notch near {} kHz");
    expectQuoted(firstNotchHz(pathCm.value * CM) / 1000, kHz);
    const [summaryHz, summaryKHz] = text.quotes("gets a first reflection notch near {} Hz. A boundary microphone a few millimetres from its plate pushes the first notch to about {} kHz");
    expectQuoted(firstNotchHz(pathM.value), summaryHz, { step: 10 });
    expectQuoted(firstNotchHz(pathCm.value * CM) / 1000, summaryKHz);
  });

  it("in-phase addition at a boundary: a = 1 → +20·log10 2 = +6.02 dB (derived)", () => {
    expectQuoted(combExtremesDb({ amplitudeRatio: 1 }).peakDb, text.quote("that in-phase addition gives up to about {} dB"));
    expectQuoted(combExtremesDb({ amplitudeRatio: 1 }).peakDb, text.quote("direct and reflected sound add in phase: up to about {} dB"));
  });
});

describe("lesson les-mtb-phase-three-to-one", () => {
  const text = lesson("les-mtb-phase-three-to-one");

  it("speed of sound and delay per distance: c = 331.3·√(1 + 20/273.15) = 343.2 m/s (Wikipedia 'Speed of sound')", () => {
    const [c, celsius] = text.quotes("At about {} m/s (the speed of sound in air at {} °C)");
    expectQuoted(speedOfSoundMs({ temperatureC: celsius.value }), c);
    const [cm, ms] = text.quotes("every {} cm of extra path is about {} ms");
    expectQuoted(delayMs({ distanceM: cm.value * CM, speedOfSoundMs: SPEED_OF_SOUND_MS }), ms);
  });

  it("two microphones at 0.3 m and 0.9 m: Δd = 0.6 m, 1.749 ms, f1 = 285.8 Hz, notches at odd multiples (derived)", () => {
    const [nearM, farM] = text.quotes("Picture a source with one microphone {} m away and a second {} m away");
    const [pathM, ms] = text.quotes("The second copy travels {} m further and arrives about {} ms later");
    expectQuoted(farM.value - nearM.value, pathM);
    expectQuoted(delayMs({ distanceM: pathM.value, speedOfSoundMs: SPEED_OF_SOUND_MS }), ms);
    const notchesHz = combNotchesHz({ pathDifferenceM: pathM.value, speedOfSoundMs: SPEED_OF_SOUND_MS, count: 4 });
    expectQuoted(notchesHz[0], text.quote("whose half-period equals the delay, about {} Hz here"));
    const multiples = text.quotes("and the others follow at {}, {}, {}… times that");
    multiples.forEach((multiple, i) => expectQuoted(notchesHz[i + 1] / notchesHz[0], multiple));
    const [sNear, sFar, sPath, sMs, sHz] = text.quotes("Two mics {} m and {} m from a source: {} m path difference, about {} ms, first notch near {} Hz");
    expectQuoted(sFar.value - sNear.value, sPath);
    expectQuoted(delayMs({ distanceM: sPath.value, speedOfSoundMs: SPEED_OF_SOUND_MS }), sMs);
    expectQuoted(firstNotchHz(sPath.value), sHz);
  });

  it("equal-level copies: a = 1 → +6.02 dB peaks, complete notches (derived)", () => {
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio: 1 });
    expectQuoted(peakDb, text.quote("If both copies were at equal level, peaks would reach {} dB"));
    text.says("the notches would be complete cancellations");
    expect(notchDb).toBe(-Infinity);
  });

  it("the 3:1 practice in line: 20·log10 3 = 9.54 dB; a = 1/3 → +2.50 / −3.52 dB, swing 6.02 dB (two-path model, derived)", () => {
    const farTimes = 3; // "at least three times as far from the source"
    text.says("the second microphone should be at least three times as far from the source as the first");
    expectQuoted(-inverseSquareChangeDb({ fromM: 1, toM: farTimes }), text.quote("three times the distance means the far microphone hears the source about {} dB lower"));
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio: twoPathAmplitudeRatio({ nearM: 1, farM: farTimes }) });
    const [down, peak, notch, swing] = text.quotes(
      "With the second copy {} dB down (a third of the amplitude), the sum still ripples between peaks of about {} dB and notches of about {} dB, a peak-to-notch swing of about {} dB",
    );
    expectQuoted(-inverseSquareChangeDb({ fromM: 1, toM: farTimes }), down);
    expectQuoted(peakDb, peak);
    expectQuoted(notchDb, notch);
    expectQuoted(peakDb - notchDb, swing);
    const [sDown, sPeak, sNotch] = text.quotes("At 3:1 the far mic is about {} dB down, yet the sum still ripples about {} dB and {} dB");
    expectQuoted(-inverseSquareChangeDb({ fromM: 1, toM: farTimes }), sDown);
    expectQuoted(peakDb, sPeak);
    expectQuoted(notchDb, sNotch);
  });

  it("what a 1 dB dip would need: notch 20·log10(1 − a) = −1 dB at a ≈ 0.109, i.e. −19.3 dB (derived)", () => {
    const [dip, down] = text.quotes("a {} dB dip needs the second copy about {} dB down");
    expectQuoted(-combExtremesDb({ amplitudeRatio: 10 ** (-down.value / 20) }).notchDb, dip);
    const [sDip, sDown] = text.quotes("A {} dB dip needs about {} dB of separation");
    expectQuoted(-combExtremesDb({ amplitudeRatio: 10 ** (-sDown.value / 20) }).notchDb, sDip);
  });

  it("the 3:1 practice off to the side: path √10·d → −10.0 dB, a = 0.316 → +2.39 / −3.30 dB (derived)", () => {
    const sidePathM = Math.hypot(1, 3); // source in front of the first mic at d, second mic 3d to the side
    const [down, peak, notch] = text.quotes("its path is a little longer again (about {} dB down), giving peaks of about {} dB and notches of about {} dB");
    expectQuoted(-inverseSquareChangeDb({ fromM: 1, toM: sidePathM }), down);
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio: twoPathAmplitudeRatio({ nearM: 1, farM: sidePathM }) });
    expectQuoted(peakDb, peak);
    expectQuoted(notchDb, notch);
  });

  it("3:1 plus a cardioid's side rejection: −9.54 − 6.02 = −15.56 dB; a = 1/6 → +1.34 / −1.58 dB (derived)", () => {
    const [angle, sideDown] = text.quotes("a cardioid with the source {}° off its axis, it is another {} dB down");
    const cardioidSideDb = patternLevelDb({ a: CARDIOID_A, angleDeg: angle.value });
    expectQuoted(-cardioidSideDb, sideDown);
    const [below, peak, notch] = text.quotes("the far copy is about {} dB below, and the ripple shrinks to about {} dB and {} dB");
    expectQuoted(-(inverseSquareChangeDb({ fromM: 1, toM: 3 }) + cardioidSideDb), below);
    const amplitudeRatio = twoPathAmplitudeRatio({ nearM: 1, farM: 3 }) * 10 ** (cardioidSideDb / 20);
    const { peakDb, notchDb } = combExtremesDb({ amplitudeRatio });
    expectQuoted(peakDb, peak);
    expectQuoted(notchDb, notch);
  });

  it("close vocal miking: 20·log10(0.6/0.05) = 21.58 dB (inverse-square law, derived)", () => {
    const nearCm = text.value("Maren sings {} cm from her microphone");
    const [farCm, down] = text.quotes("Joss's microphone, {} cm from her mouth, hears her voice about {} dB down");
    expectQuoted(-inverseSquareChangeDb({ fromM: nearCm * CM, toM: farCm.value * CM }), down);
  });
});

describe("lesson les-mtb-feedback-monitors", () => {
  const text = lesson("les-mtb-feedback-monitors");

  it("stability margin as used in the PAG equation (Ballou, Handbook for Sound Engineers, 4th ed., eq. 34-5: FSM 6 dB)", () => {
    expectQuoted(pagChangeDb({ stabilityMarginDb: 0 }), text.quote("subtracts a {} dB feedback stability margin"));
    expectQuoted(pagChangeDb({ stabilityMarginDb: 0 }), text.quote("before feedback, with a {} dB margin"));
  });

  it("microphone-to-mouth and microphone-to-wedge distances (inverse-square law; D_s and D_1 terms of Ballou eq. 34-5)", () => {
    const [fromCm, toCm, fallDb, gainDb] = text.quotes(
      "if Maren moves from {} cm to {} cm from her microphone, her level at the microphone falls by about {} dB, and the engineer has to add {} dB of gain",
    );
    expectQuoted(-inverseSquareChangeDb({ fromM: fromCm.value * CM, toM: toCm.value * CM }), fallDb);
    expectQuoted(-pagChangeDb({ dsM: (REFERENCE_GAIN_GEOMETRY.dsM * toCm.value) / fromCm.value }), gainDb);
    text.says("That gain comes straight out of the margin");
    const [sFrom, sTo, sSpent] = text.quotes("Moving from {} cm to {} cm from the microphone spends about {} dB of margin");
    expectQuoted(-pagChangeDb({ dsM: (REFERENCE_GAIN_GEOMETRY.dsM * sTo.value) / sFrom.value }), sSpent);
    expectQuoted(
      pagChangeDb({ d1M: 2 * REFERENCE_GAIN_GEOMETRY.d1M }),
      text.quote("Each doubling of the distance from the microphone to the wedge is worth about the same {} dB"),
    );
  });

  it("number of open microphones: −10·log10 NOM (Ballou eq. 34-5): 2 → −3.01 dB, 4 → −6.02 dB", () => {
    expectQuoted(-pagChangeDb({ openMics: 2 }), text.quote("each doubling of the number of open microphones costs about {} dB of potential gain"));
    expectQuoted(-pagChangeDb({ openMics: 4 }), text.quote("going from one to four costs about {} dB"));
    expectQuoted(-pagChangeDb({ openMics: 2 }), text.quote("Each doubling of open microphones costs about {} dB"));
  });

  it("pattern figures for wedge placement (Eargle ch. 5; Heller 2011; HyperPhysics)", () => {
    text.says("For a cardioid that is straight behind");
    expect(patternFigures({ a: CARDIOID_A }).nullAnglesDeg).toEqual([180]);
    const [superNull, superRear] = text.quotes("For a supercardioid it is about {}° off axis (directly behind it is only about {} dB down)");
    expectQuoted(firstNullDeg(SUPERCARDIOID_A), superNull);
    expectQuoted(dbDown(SUPERCARDIOID_A, 180), superRear);
    const [hyperNull, hyperRear] = text.quotes("For a hypercardioid the null is at about {}°, and straight behind it is only about {} dB down");
    expectQuoted(firstNullDeg(HYPERCARDIOID_A), hyperNull);
    expectQuoted(dbDown(HYPERCARDIOID_A, 180), hyperRear);
  });

  it("NIOSH recommended exposure times (NIOSH 98-126: 94 dBA → 1 h, 100 dBA → 15 min)", () => {
    text.says("94 dBA is one hour's full daily allowance");
    expect(permissibleExposureHours({ levelDba: 94, standard: "niosh" })).toBeCloseTo(1, 9);
    const [level, minutes] = text.quotes("and {} dBA only {} minutes");
    expectQuoted(permissibleExposureHours({ levelDba: level.value, standard: "niosh" }) * 60, minutes);
  });
});
