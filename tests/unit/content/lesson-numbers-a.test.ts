import { describe, expect, it } from "vitest";
import {
  combExtremesDb,
  combNotchesHz,
  combResponseDb,
  dbuToVolts,
  dbvToDbu,
  dbvToVolts,
  HYPERCARDIOID_A,
  inverseSquareChangeDb,
  micOutputVolts,
  micSensitivityDbv,
  patternFigures,
  patternLevelDb,
  PHANTOM_SUPPLIES,
  phantomAtMic,
  PICKUP_PATTERN_IDS,
  PICKUP_PATTERNS,
  permissibleExposureHours,
  proximityBoostDb,
  reflectedImpedanceOhms,
  splDbFromPa,
  SUBCARDIOID_A,
  SUPERCARDIOID_A,
  transformer,
  voltsToDbu,
  voltsToDbv,
} from "@/lib/acoustics";
import { expectQuoted, loadLessons } from "../../support/lesson-quotes";

// Every computed number quoted in the courses how-microphones-hear and direct-boxes-and-levels,
// read from the lesson and checked against lib/acoustics (tests/support/lesson-quotes.ts): the
// library value must round to what the lesson prints. Where a lesson states the inputs (distances,
// levels, ratios), they are read from it too. Full citations: tests/sources.md.
// Lessons les-mic-moving-coil and les-di-ground-lift quote no computed numbers.
//
// The proximity figures are pinned at c = 343 m/s, as les-pattern-proximity states in its prose
// (343.2 m/s, the ISO 9613-1 reference, moves them by at most 0.005 dB).

const lesson = await loadLessons();
const SPEED_OF_SOUND_MS = 343.0;
const CM = 0.01;

const CARDIOID_A = PICKUP_PATTERNS.cardioid.a;
const FIGURE8_A = PICKUP_PATTERNS.figure8.a;
const OMNI_A = PICKUP_PATTERNS.omni.a;
/** The "3:5" supercardioid, which matches HyperPhysics' printed 127° null. */
const SUPERCARDIOID_3_TO_5_A = 0.375;

const P48 = PHANTOM_SUPPLIES.P48;
const MINUTES_PER_HOUR = 60;

function firstNullDeg(a: number): number {
  return patternFigures({ a }).nullAnglesDeg[0];
}

/** How far below the front a pattern is at an angle, dB (positive: "n dB down"). */
function dbDown(a: number, angleDeg: number): number {
  return -patternLevelDb({ a, angleDeg });
}

function boostAt100HzDb(a: number, distanceM: number): number {
  return proximityBoostDb({ a, distanceM, frequencyHz: 100, speedOfSoundMs: SPEED_OF_SOUND_MS });
}

function nioshHours(levelDba: number): number {
  return permissibleExposureHours({ levelDba, standard: "niosh" });
}

describe("how-microphones-hear / transducers", () => {
  it("les-mic-condenser-phantom: IEC 61938:2018 P48 (Sound On Sound glossary 'Phantom Power'; Wikipedia 'Phantom power')", () => {
    const text = lesson("les-mic-condenser-phantom");
    const [supply, resistorKOhm] = text.quotes("puts a nominal {} V on both signal conductors, pin 2 and pin 3, through two matched resistors of {} kΩ");
    expectQuoted(P48.nominalV, supply);
    expectQuoted(P48.feedResistorPerLegOhms / 1000, resistorKOhm);
    expectQuoted(P48.maxCurrentMa, text.quote("The standard allows up to {} mA for the microphone"));
    // The mic sees the two feed resistors in parallel, R/2 (IEC 61938 feed network, derived)
    const [parallelKOhm, seriesSupply] = text.quotes("The microphone sees the two resistors in parallel, {} kΩ in series with a {} V supply");
    expectQuoted(P48.feedResistorPerLegOhms / 2 / 1000, parallelKOhm);
    expectQuoted(P48.nominalV, seriesSupply);
    // V_mic = 48 − 0.005 × 3405 = 30.98 V (derived)
    const [currentMa, volts] = text.quotes("A microphone drawing {} mA therefore sees about {} V at its connector");
    expectQuoted(phantomAtMic({ supply: "P48", supplyV: seriesSupply.value, currentMa: currentMa.value }).voltsAtMic, volts);
    const [summaryV, summaryKOhm] = text.quotes("P48 phantom power supplies {} V nominal through two matched {} kΩ resistors");
    expectQuoted(P48.nominalV, summaryV);
    expectQuoted(P48.feedResistorPerLegOhms / 1000, summaryKOhm);
  });

  it("les-mic-ribbon: figure-8 nulls at 90° (Eargle Table 6-1; HyperPhysics) and proximity boost 20.80 dB at 5 cm, 100 Hz (derived)", () => {
    const text = lesson("les-mic-ribbon");
    expectQuoted(firstNullDeg(FIGURE8_A), text.quote("with deep nulls at {}° to either side"));
    expectQuoted(firstNullDeg(FIGURE8_A), text.quote("opposite-polarity rear lobe and nulls at {}°"));
    text.says("a figure-8 five centimetres from a small source");
    expectQuoted(boostAt100HzDb(FIGURE8_A, 5 * CM), text.quote("is boosted by about {} dB at 100 Hz"));
    expectQuoted(P48.nominalV, text.quote("a sudden {} V step across that path"));
  });

  it("les-mic-sensitivity-spl: sensitivity (sengpielaudio; ISO 1683 20 µPa), output at an SPL, inverse square, NIOSH 98-126", () => {
    const text = lesson("les-mic-sensitivity-spl");
    // ISO 1683:2015 reference pressure 20 µPa: 1 Pa → 93.98 dB SPL
    const [pa, spl] = text.quotes("The usual test condition is a pressure of {} pascal at 1 kHz, which is about {} dB SPL");
    expectQuoted(splDbFromPa(pa.value), spl);
    // sengpielaudio "Microphone sensitivity and conversion": 2 mV/Pa → −53.98, 12 mV/Pa → −38.42 dB re 1 V/Pa
    const [dynMvPa, dynDb] = text.quotes("A typical stage dynamic makes about {} mV/Pa, which is about {} dB re 1 V/Pa");
    expectQuoted(micSensitivityDbv({ mvPerPa: dynMvPa.value }), dynDb);
    const [condMvPa, condDb] = text.quotes("A typical condenser makes about {} mV/Pa, about {} dB re 1 V/Pa");
    expectQuoted(micSensitivityDbv({ mvPerPa: condMvPa.value }), condDb);
    const [summaryMvPa, summaryDb] = text.quotes("{} mV/Pa is about {} dB re 1 V/Pa");
    expectQuoted(micSensitivityDbv({ mvPerPa: summaryMvPa.value }), summaryDb);
    // 20·log10 10 = 20 dB (ITU-R V.574-5, decibel of a field quantity)
    text.says("A difference of 20 dB is a factor of ten in voltage");
    expect(dbvToVolts(text.value("A difference of {} dB is a factor of ten in voltage"))).toBeCloseTo(10, 9);

    // Output at an SPL with the trade's shortcut 94 dB SPL = 1 Pa: V = S·10^((L − 94)/20) (derived)
    const [voiceMvPa, voiceSpl, voiceMv, voiceDbu] = text.quotes("A dynamic with {} mV/Pa on Maren's voice at {} dB SPL makes about {} mV, which is about {} dBu");
    const voiceVolts = micOutputVolts({ mvPerPa: voiceMvPa.value, splDb: voiceSpl.value, assume94DbIs1Pa: true });
    expectQuoted(voiceVolts * 1000, voiceMv);
    expectQuoted(voltsToDbu(voiceVolts), voiceDbu);
    const kickSpl = text.value("where peaks of {} dB SPL are ordinary");
    const [moreDb, kickVolts, kickDbu] = text.quotes("That is {} dB more pressure, so a hundred times the voltage: about {} V, or about {} dBu");
    expectQuoted(kickSpl - voiceSpl.value, moreDb);
    const kickDynamicVolts = micOutputVolts({ mvPerPa: voiceMvPa.value, splDb: kickSpl, assume94DbIs1Pa: true });
    expect(kickDynamicVolts / voiceVolts).toBeCloseTo(100, 9); // "a hundred times the voltage"
    expectQuoted(kickDynamicVolts, kickVolts);
    expectQuoted(voltsToDbu(kickDynamicVolts), kickDbu);
    const [summarySpl, times, summaryRef] = text.quotes("{} dB SPL gives {} times the {} dB output");
    expectQuoted(
      micOutputVolts({ mvPerPa: 2, splDb: summarySpl.value, assume94DbIs1Pa: true }) / micOutputVolts({ mvPerPa: 2, splDb: summaryRef.value, assume94DbIs1Pa: true }),
      times,
    );
    const [condSpl, condMv, condV, condDbu] = text.quotes("At the same {} dB SPL, {} mV/Pa becomes {} V, about {} dBu");
    const kickCondenserVolts = micOutputVolts({ mvPerPa: condMv.value, splDb: condSpl.value, assume94DbIs1Pa: true });
    expectQuoted(kickCondenserVolts, condV);
    expectQuoted(voltsToDbu(kickCondenserVolts), condDbu);

    // Inverse-square law, ΔL = −20·log10(r2/r1): ×2 → −6.02 dB, ×4 → −12.04 dB (free-field point source, derived)
    expectQuoted(-inverseSquareChangeDb({ fromM: 1, toM: 2 }), text.quote("each doubling of distance lowers the level by about {} dB"));
    expectQuoted(-inverseSquareChangeDb({ fromM: 1, toM: 2 }), text.quote("Each doubling of distance lowers the level by about {} dB in the free field"));
    const [fromCm, toCm, fallDb] = text.quotes("Moving the condenser from {} cm to {} cm in front of the kick head lowers the level it hears by about {} dB");
    expectQuoted(-inverseSquareChangeDb({ fromM: fromCm.value * CM, toM: toCm.value * CM }), fallDb);
    // NIOSH 98-126: 100 dBA → 15 min
    const [level, minutes] = text.quotes("At {} dBA the NIOSH recommended limit is only {} minutes a day");
    expectQuoted(nioshHours(level.value) * MINUTES_PER_HOUR, minutes);
  });
});

describe("how-microphones-hear / pickup-patterns", () => {
  it("les-pattern-first-order: the table (Eargle Table 6-1: REE, DF; Heller 2011: supercardioid 0.366, 125.26°)", () => {
    const text = lesson("les-pattern-first-order");
    // Pattern | Omni share A | REE | Diffuse pickup vs omni | Distance factor | Null angle
    const rows = [
      { name: "Omni", a: OMNI_A, hasNull: false },
      { name: "Subcardioid", a: SUBCARDIOID_A, hasNull: false },
      { name: "Cardioid", a: CARDIOID_A, hasNull: true },
      { name: "Supercardioid", a: SUPERCARDIOID_A, hasNull: true },
      { name: "Hypercardioid", a: HYPERCARDIOID_A, hasNull: true },
      { name: "Figure-8", a: FIGURE8_A, hasNull: true },
    ];
    for (const row of rows) {
      const figures = patternFigures({ a: row.a });
      const [a, ree, diffuseDb, distanceFactor, nullDeg] = text.quotes(`${row.name} | {} | {} | {} dB | {} | ${row.hasNull ? "{}°" : "none"}`);
      expectQuoted(row.a, a);
      expectQuoted(figures.randomEnergyEfficiency, ree);
      // Diffuse pickup vs omni = 10·log10 REE
      expectQuoted(figures.ambientRejectionDb, diffuseDb);
      // Distance factor √(1/REE)
      expectQuoted(figures.distanceFactor, distanceFactor);
      if (row.hasNull) expectQuoted(figures.nullAnglesDeg[0], nullDeg);
      else expect(figures.nullAnglesDeg).toEqual([]);
    }
  });

  it("les-pattern-first-order: the prose around the table", () => {
    const text = lesson("les-pattern-first-order");
    const cardioid = patternFigures({ a: CARDIOID_A });
    expectQuoted(CARDIOID_A, text.quote("Cardioid, A = {}: the heart shape"));
    expectQuoted(HYPERCARDIOID_A, text.quote("Hypercardioid, A = {}: narrower still"));
    expectQuoted(SUBCARDIOID_A, text.quote("Subcardioid, A around {}: a flattened circle"));
    const [rounded, optimum] = text.quotes("Supercardioid, A about {} (the textbook optimum is {})");
    expectQuoted(SUPERCARDIOID_A, rounded);
    expectQuoted(SUPERCARDIOID_A, optimum);
    text.says("A cardioid scores one third");
    expect(cardioid.randomEnergyEfficiency).toBeCloseTo(1 / 3, 9);
    const [factor, omniCm, cardioidCm] = text.quotes("A cardioid has a distance factor of about {}: if an omni gives the right balance at {} cm, a cardioid gives the same balance at about {} cm");
    expectQuoted(cardioid.distanceFactor, factor);
    expectQuoted(cardioid.distanceFactor * omniCm.value, cardioidCm);
    // Sound On Sound (Robjohns) and Tashev round the supercardioid to 0.37/0.63; HyperPhysics' 3:5 blend gives 127°
    const [roundedA, roundedNull, threeToFiveA, threeToFiveNull] = text.quotes("tables that round it to {} put the null at about {}°, and a {} blend puts it at about {}°");
    expectQuoted(firstNullDeg(roundedA.value), roundedNull);
    expect(threeToFiveA.value).toBe(SUPERCARDIOID_3_TO_5_A);
    expectQuoted(firstNullDeg(threeToFiveA.value), threeToFiveNull);
    const [reeOmni, reeHyper] = text.quotes("{} for omni, one third for cardioid, {} for hypercardioid");
    expectQuoted(patternFigures({ a: OMNI_A }).randomEnergyEfficiency, reeOmni);
    expectQuoted(patternFigures({ a: HYPERCARDIOID_A }).randomEnergyEfficiency, reeHyper);
    const [dfCardioid, dfSuper, dfHyper] = text.quotes("about {} for cardioid, {} for supercardioid, {} for hypercardioid");
    expectQuoted(cardioid.distanceFactor, dfCardioid);
    expectQuoted(patternFigures({ a: SUPERCARDIOID_A }).distanceFactor, dfSuper);
    expectQuoted(patternFigures({ a: HYPERCARDIOID_A }).distanceFactor, dfHyper);
    const [nullCardioid, nullSuperLow, nullSuperHigh, nullHyper, nullFig8] = text.quotes(
      "Nulls sit at {}° for cardioid, about {}° to {}° for supercardioid, {}° for hypercardioid and {}° for figure-8",
    );
    expectQuoted(firstNullDeg(CARDIOID_A), nullCardioid);
    expectQuoted(firstNullDeg(SUPERCARDIOID_A), nullSuperLow);
    expectQuoted(firstNullDeg(roundedA.value), nullSuperHigh);
    expectQuoted(firstNullDeg(HYPERCARDIOID_A), nullHyper);
    expectQuoted(firstNullDeg(FIGURE8_A), nullFig8);
  });

  it("les-pattern-first-order: the claims about the table (Heller 2011, citing Gerzon, JASA 60, 278, 1976)", () => {
    const text = lesson("les-pattern-first-order");
    const figures = PICKUP_PATTERN_IDS.map((id) => ({ id, ...patternFigures({ a: PICKUP_PATTERNS[id].a }) }));
    // A = 0.25 minimises REE
    text.says("the hypercardioid, not the supercardioid, rejects the most diffuse sound: it has the lowest REE of the family");
    const lowestRee = [...figures].sort((x, y) => x.randomEnergyEfficiency - y.randomEnergyEfficiency)[0];
    expect(lowestRee.id).toBe("hypercardioid");
    // A = (√3 − 1)/2 maximises the hemispherical front-to-back ratio
    text.says("The supercardioid is the pattern with the best ratio of front-half pickup to rear-half pickup");
    const bestFrontToBack = [...figures].sort((x, y) => y.frontToBackHemiDb - x.frontToBackHemiDb)[0];
    expect(bestFrontToBack.id).toBe("supercardioid");
    // Eargle Table 6-1: cardioid and figure-8 both RE 0.33
    text.says("a figure-8 rejects diffuse sound exactly as well as a cardioid");
    expect(patternFigures({ a: FIGURE8_A }).randomEnergyEfficiency).toBeCloseTo(patternFigures({ a: CARDIOID_A }).randomEnergyEfficiency, 9);
  });

  it("les-pattern-nulls-wedges: levels at 90° and 180°, null cones (HyperPhysics −6 / −8.5 / −12 at 90°; Heller −11.44 dB at 180°)", () => {
    const text = lesson("les-pattern-nulls-wedges");
    text.says("At 90°, the side of the microphone");
    expectQuoted(dbDown(CARDIOID_A, 90), text.quote("a cardioid is about {} dB down;"));
    expectQuoted(dbDown(SUPERCARDIOID_A, 90), text.quote("a supercardioid is about {} dB down;"));
    expectQuoted(dbDown(HYPERCARDIOID_A, 90), text.quote("a hypercardioid is about {} dB down."));
    const [side, sideCardioid, sideSuper, sideHyper] = text.quotes("at {}° a cardioid is about {} dB down, a supercardioid about {} dB, a hypercardioid about {} dB");
    expectQuoted(dbDown(CARDIOID_A, side.value), sideCardioid);
    expectQuoted(dbDown(SUPERCARDIOID_A, side.value), sideSuper);
    expectQuoted(dbDown(HYPERCARDIOID_A, side.value), sideHyper);

    text.says("The cardioid has its only null there");
    expect(patternLevelDb({ a: CARDIOID_A, angleDeg: 180 })).toBe(-Infinity);
    expectQuoted(dbDown(SUPERCARDIOID_A, 180), text.quote("is only about {} dB down directly behind"));
    expectQuoted(dbDown(HYPERCARDIOID_A, 180), text.quote("with its larger rear lobe, is only about {} dB down at 180°"));
    const [rearSuper, rearHyper] = text.quotes("a supercardioid is about {} dB down there and a hypercardioid about {} dB");
    expectQuoted(dbDown(SUPERCARDIOID_A, 180), rearSuper);
    expectQuoted(dbDown(HYPERCARDIOID_A, 180), rearHyper);

    const superNullDeg = firstNullDeg(SUPERCARDIOID_A);
    const hyperNullDeg = firstNullDeg(HYPERCARDIOID_A);
    const [superNull, roundedNull, superTail] = text.quotes(
      "a cone of nulls at about {}° from the front for the textbook blend, or about {}° for the rounded blend many tables use. That is about {}° either side of the tail",
    );
    expectQuoted(superNullDeg, superNull);
    expectQuoted(firstNullDeg(0.37), roundedNull); // the 0.37/0.63 blend (Sound On Sound, Robjohns)
    expectQuoted(180 - superNullDeg, superTail);
    const [hyperNull, hyperTail] = text.quotes("a cone of nulls at about {}°, about {}° either side of the tail");
    expectQuoted(hyperNullDeg, hyperNull);
    expectQuoted(180 - hyperNullDeg, hyperTail);
    const [nullsLow, nullsHigh, nullsHyper] = text.quotes("Nulls: 180° for cardioid, about {}° to {}° for supercardioid, about {}° for hypercardioid");
    expectQuoted(superNullDeg, nullsLow);
    expectQuoted(firstNullDeg(0.37), nullsHigh);
    expectQuoted(hyperNullDeg, nullsHyper);
    const [wedgeSuper, wedgeHyper] = text.quotes("splayed about {}° off the tail for a supercardioid, about {}° off it for a hypercardioid");
    expectQuoted(180 - superNullDeg, wedgeSuper);
    expectQuoted(180 - hyperNullDeg, wedgeHyper);
  });

  it("les-pattern-nulls-wedges: the wedge table, r(θ) = A + B·cos θ at each pattern's null angle (derived)", () => {
    const text = lesson("les-pattern-nulls-wedges");
    // Wedge at | Cardioid | Supercardioid | Hypercardioid
    const [rearSuper, rearHyper] = text.quotes("180° (straight behind) | null | {} dB | {} dB");
    expect(patternLevelDb({ a: CARDIOID_A, angleDeg: 180 })).toBe(-Infinity);
    expectQuoted(patternLevelDb({ a: SUPERCARDIOID_A, angleDeg: 180 }), rearSuper);
    expectQuoted(patternLevelDb({ a: HYPERCARDIOID_A, angleDeg: 180 }), rearHyper);
    const [superRow, cardioidAtSuper, hyperAtSuper] = text.quotes("{}° | {} dB | null | {} dB");
    expectQuoted(firstNullDeg(SUPERCARDIOID_A), superRow);
    expectQuoted(patternLevelDb({ a: CARDIOID_A, angleDeg: superRow.value }), cardioidAtSuper);
    expectQuoted(patternLevelDb({ a: HYPERCARDIOID_A, angleDeg: superRow.value }), hyperAtSuper);
    const [hyperRow, cardioidAtHyper, superAtHyper] = text.quotes("{}° | {} dB | {} dB | null");
    expectQuoted(firstNullDeg(HYPERCARDIOID_A), hyperRow);
    expectQuoted(patternLevelDb({ a: CARDIOID_A, angleDeg: hyperRow.value }), cardioidAtHyper);
    expectQuoted(patternLevelDb({ a: SUPERCARDIOID_A, angleDeg: hyperRow.value }), superAtHyper);
  });

  it("les-pattern-proximity: ideal point-source boost at 100 Hz, c = 343 m/s (spherical-wave particle velocity, Kinsler & Frey; derived)", () => {
    const text = lesson("les-pattern-proximity");
    expectQuoted(SPEED_OF_SOUND_MS, text.quote("With an ideal point source and speed of sound {} m/s"));
    // Table: distance | about n dB (cardioid 1 cm 28.73, 5 cm 14.89, 10 cm 9.27, 30 cm 2.62, 1 m 0.31; derived)
    for (const [distance, unitM] of [
      ["2 cm", CM],
      ["5 cm", CM],
      ["10 cm", CM],
      ["30 cm", CM],
      ["1 m", 1],
    ] as const) {
      const distanceM = Number(distance.split(" ")[0]) * unitM;
      expectQuoted(boostAt100HzDb(CARDIOID_A, distanceM), text.quote(`${distance} | about {} dB`));
    }
    const [fig8Cm, fig8Db] = text.quotes("A figure-8 at {} cm is boosted by about {} dB at the same frequency");
    expectQuoted(boostAt100HzDb(FIGURE8_A, fig8Cm.value * CM), fig8Db);
    const [s5, s30, s100, sFig8] = text.quotes("about {} dB at 5 cm, {} dB at 30 cm, {} dB at 1 m; a figure-8 at 5 cm gets about {} dB");
    expectQuoted(boostAt100HzDb(CARDIOID_A, 5 * CM), s5);
    expectQuoted(boostAt100HzDb(CARDIOID_A, 30 * CM), s30);
    expectQuoted(boostAt100HzDb(CARDIOID_A, 1), s100);
    expectQuoted(boostAt100HzDb(FIGURE8_A, 5 * CM), sFig8);
    text.says("An omni shows none.");
    expect(boostAt100HzDb(OMNI_A, 5 * CM)).toBe(0);
    // A cardioid at r behaves like a figure-8 at 2r (B = 1/2 in 10·log10(1 + (B/kr)²))
    text.says("A cardioid, half gradient, behaves like a figure-8 at twice the distance");
    expect(boostAt100HzDb(CARDIOID_A, 10 * CM)).toBeCloseTo(boostAt100HzDb(FIGURE8_A, 20 * CM), 9);
    // Well below the corner the boost rises 6 dB per octave: compare 50 Hz with 100 Hz at 1 cm
    const octaveRiseDb =
      proximityBoostDb({ a: CARDIOID_A, distanceM: CM, frequencyHz: 50, speedOfSoundMs: SPEED_OF_SOUND_MS }) - boostAt100HzDb(CARDIOID_A, CM);
    expectQuoted(octaveRiseDb, text.quote("the boost rises by about {} dB for every octave you go down"));
    expectQuoted(octaveRiseDb, text.quote("the boost rises about {} dB per octave below its corner"));
    // Inverse-square law, ×2 → −6.02 dB
    const [fromCm, toCm, fallDb] = text.quotes("moving from {} cm to {} cm lowers the level by about {} dB");
    expectQuoted(-inverseSquareChangeDb({ fromM: fromCm.value * CM, toM: toCm.value * CM }), fallDb);
  });
});

describe("direct-boxes-and-levels / levels-and-lines", () => {
  it("les-di-decibel-references: ratios, references (ITU-R BS.645-2, V.574-5; ISO 1683), line levels (ControlBooth), NIOSH 98-126", () => {
    const text = lesson("les-di-decibel-references");
    // 20·log10 2 = 6.02 dB, 20·log10 10 = 20 dB
    const [doubleDb, tenDb] = text.quotes("Double a voltage and you have added about {} dB; multiply it by ten and you have added {} dB");
    expectQuoted(voltsToDbv(2), doubleDb);
    expectQuoted(voltsToDbv(10), tenDb);
    // 0 dBu = √(1 mW × 600 Ω) = 0.7746 V (STx manual; ITU-R BS.645-2 prints 0.775 V)
    const [dbuRef, milliwatt, ohms] = text.quotes("dBu: decibels relative to {} V. The odd number is historical: it is the voltage that delivers {} milliwatt into {} Ω");
    expectQuoted(dbuToVolts(0), dbuRef);
    expectQuoted(Math.sqrt(milliwatt.value * 1e-3 * ohms.value), dbuRef);
    const [summaryDbuRef, summaryDbvRef] = text.quotes("levels with a fixed reference: {} V, {} V and 20 µPa");
    expectQuoted(dbuToVolts(0), summaryDbuRef);
    expectQuoted(dbvToVolts(0), summaryDbvRef);
    expectQuoted(splDbFromPa(1), text.quote("One pascal, the pressure used to rate microphones, is about {} dB SPL"));
    // 0 dBV = +2.2185 dBu (itwissen.info "1 dBV ≈ +2.2 dBu")
    const [volt, dbv, dbu] = text.quotes("Because the two voltage references differ, the same voltage has two numbers: {} V is {} dBV and about {} dBu");
    expectQuoted(voltsToDbv(volt.value), dbv);
    expectQuoted(voltsToDbu(volt.value), dbu);
    const [sVolt, sDbv, sDbu, sPa, sSpl] = text.quotes("{} V is {} dBV and about {} dBu; {} Pa is about {} dB SPL");
    expectQuoted(voltsToDbv(sVolt.value), sDbv);
    expectQuoted(voltsToDbu(sVolt.value), sDbu);
    expectQuoted(splDbFromPa(sPa.value), sSpl);

    // Mic output at 94 dB SPL with the trade's shortcut 94 dB SPL = 1 Pa (derived)
    const [mvPa, spl, mv, dbuVoice] = text.quotes("A dynamic microphone with a sensitivity of {} mV/Pa, on a voice at {} dB SPL, makes about {} mV: about {} dBu");
    const voiceVolts = micOutputVolts({ mvPerPa: mvPa.value, splDb: spl.value, assume94DbIs1Pa: true });
    expectQuoted(voiceVolts * 1000, mv);
    expectQuoted(voltsToDbu(voiceVolts), dbuVoice);
    const [target, gain] = text.quotes("bringing the 2 mV voice to {} dBu takes about {} dB of gain");
    expectQuoted(target.value - voltsToDbu(voiceVolts), gain);

    // ControlBooth: −10 dBV = 0.316 V, +4 dBu = 1.228 V, 11.78 dB apart
    expectQuoted(dbvToVolts(-10), text.quote("work around a nominal −10 dBV, about {} V"));
    expectQuoted(dbvToVolts(-10), text.quote("consumer line level: about {} V nominal"));
    expectQuoted(dbuToVolts(4), text.quote("work around a nominal +4 dBu, about {} V"));
    expectQuoted(4 - dbvToDbu(-10), text.quote("The gap between the two nominal line levels is about {} dB"));
    const [sConsumer, sPro, sGap] = text.quotes("consumer line level is −10 dBV (about {} V); professional line level is +4 dBu (about {} V), about {} dB higher");
    expectQuoted(dbvToVolts(-10), sConsumer);
    expectQuoted(dbuToVolts(4), sPro);
    expectQuoted(4 - dbvToDbu(-10), sGap);

    // NIOSH 98-126: 85 dBA for 8 h, 3 dB exchange rate; 94 dBA → 1 h; 100 dBA → 15 min
    const [rel, relHours, exchange] = text.quotes("allows {} dBA for {} hours and halves the time for every {} dB more");
    expectQuoted(nioshHours(rel.value), relHours);
    expect(nioshHours(rel.value + exchange.value) / nioshHours(rel.value)).toBeCloseTo(1 / 2, 9);
    const [level1, hours1, level2, minutes2] = text.quotes("At {} dBA that is {} hour; at the {} dBA on the band's sheet it is {} minutes");
    expectQuoted(nioshHours(level1.value), hours1);
    expectQuoted(nioshHours(level2.value) * MINUTES_PER_HOUR, minutes2);
    const [sRel, sHours, sExchange, sH, sL1, sMin, sL2] = text.quotes("The NIOSH limit is {} dBA for {} hours, halving with each {} dB: {} hour at {} dBA, {} minutes at {} dBA");
    expectQuoted(nioshHours(sRel.value), sHours);
    expect(nioshHours(sRel.value + sExchange.value) / nioshHours(sRel.value)).toBeCloseTo(1 / 2, 9);
    expectQuoted(nioshHours(sL1.value), sH);
    expectQuoted(nioshHours(sL2.value) * MINUTES_PER_HOUR, sMin);
  });

  it("les-di-impedance-bridging: voltage divider Z_load/(Z_source + Z_load) (Ballou, interconnection chapter; from memory)", () => {
    const text = lesson("les-di-impedance-bridging");
    const [sourceOhms, loadOhms] = text.quotes("typically {} Ω out into {} Ω in");
    const matchedRatio = loadOhms.value / (sourceOhms.value + loadOhms.value);
    text.says("Matching throws away half of the voltage");
    expect(matchedRatio).toBeCloseTo(1 / 2, 9);
    expectQuoted(-voltsToDbv(matchedRatio), text.quote("Matching throws away half of the voltage, a {} dB loss"));
    // A load ten times the source: 10/(10 + 1) → −0.83 dB
    text.says("With a tenfold ratio the loss is well under a decibel");
    expect(-voltsToDbv(10 / (10 + 1))).toBeLessThan(1);
  });

  it("les-di-balanced-lines: 60 dB as a voltage ratio is 10^(−60/20) = 0.001 (decibel of a field quantity, ITU-R V.574-5)", () => {
    const text = lesson("les-di-balanced-lines");
    const rejectionDb = text.value("An input with {} dB of rejection reduces common-mode noise to a thousandth of its voltage");
    expect(dbvToVolts(-rejectionDb)).toBeCloseTo(1 / 1000, 9);
    const summaryDb = text.value("{} dB means noise reduced to a thousandth of its voltage");
    expect(dbvToVolts(-summaryDb)).toBeCloseTo(1 / 1000, 9);
  });
});

describe("direct-boxes-and-levels / direct-boxes", () => {
  it("les-di-passive-active: N:1 transformer, −20·log10 N dB and N² impedance (Electronic Musician 'Going Direct'; atelier-der-tonkunst.de)", () => {
    const text = lesson("les-di-passive-active");
    const [n10, drop10, z10] = text.quotes("A {}:1 transformer lowers the level by {} dB and multiplies impedance by {}");
    expectQuoted(-transformer({ turnsRatio: n10.value }).voltageChangeDb, drop10);
    expectQuoted(transformer({ turnsRatio: n10.value }).impedanceRatio, z10);
    const [n12, drop12, z12] = text.quotes("A {}:1 transformer lowers the level by about {} dB and multiplies impedance by {}");
    expectQuoted(-transformer({ turnsRatio: n12.value }).voltageChangeDb, drop12);
    expectQuoted(transformer({ turnsRatio: n12.value }).impedanceRatio, z12);
    // Reflected load Z_p = N²·Z_s: 12:1 into 1.5 kΩ → 216 kΩ, into 2 kΩ → 288 kΩ (derived)
    const [ratio, preampKOhm, loadKOhm] = text.quotes("A {}:1 DI feeding a mic preamp with a {} kΩ input presents a load of about {} kΩ to the instrument");
    expectQuoted(reflectedImpedanceOhms({ turnsRatio: ratio.value, loadOhms: preampKOhm.value * 1000 }) / 1000, loadKOhm);
    const [preamp2KOhm, load2KOhm] = text.quotes("Feeding a preamp with a {} kΩ input, the load is about {} kΩ");
    expectQuoted(reflectedImpedanceOhms({ turnsRatio: ratio.value, loadOhms: preamp2KOhm.value * 1000 }) / 1000, load2KOhm);
    const [sRatio, sDrop, sPreamp, sLoad] = text.quotes("A {}:1 DI drops the level by about {} dB and turns a {} kΩ preamp input into a load of about {} kΩ");
    expectQuoted(-transformer({ turnsRatio: sRatio.value }).voltageChangeDb, sDrop);
    expectQuoted(reflectedImpedanceOhms({ turnsRatio: sRatio.value, loadOhms: sPreamp.value * 1000 }) / 1000, sLoad);
    // IEC 61938 P48 feed network: V − I·R/2 (derived)
    const [resistorKOhm, currentMa, volts] = text.quotes("a P48 supply has {} kΩ in each leg, so a DI drawing {} mA receives only about {} V at its connector");
    expectQuoted(P48.feedResistorPerLegOhms / 1000, resistorKOhm);
    expectQuoted(phantomAtMic({ supply: "P48", supplyV: 48, currentMa: currentMa.value }).voltsAtMic, volts);
  });

  it("les-di-thru-amp-feeds: loads in parallel, a line signal through a DI, speaker-level voltage (Ohm's law; derived)", () => {
    const text = lesson("les-di-thru-amp-feeds");
    // Two loads in parallel: R1·R2/(R1 + R2) (common practice; lib/acoustics has no helper for it)
    const [diMegohm, ampMegohm] = text.quotes("With an active DI of {} MΩ or more feeding an amplifier of about {} MΩ");
    text.says("the combined load is still about half a megohm");
    expect((diMegohm.value * ampMegohm.value) / (diMegohm.value + ampMegohm.value)).toBeCloseTo(1 / 2, 9);
    // +4 dBu through a 12:1 transformer: 4 − 21.58 = −17.58 dBu (derived)
    const [level, ratio, arrives] = text.quotes("a {} dBu signal through a {}:1 DI transformer arrives at the preamp at about {} dBu");
    expectQuoted(level.value + transformer({ turnsRatio: ratio.value }).voltageChangeDb, arrives);
    const [sLevel, sRatio, sArrives] = text.quotes("A {} dBu line signal through a {}:1 DI arrives at about {} dBu");
    expectQuoted(sLevel.value + transformer({ turnsRatio: sRatio.value }).voltageChangeDb, sArrives);
    // P = V²/R → V = √(P·R): 100 W into 8 Ω → 28.28 V (Ohm's law; lib/acoustics has no helper for it)
    const [watts, ohms, volts, dbu] = text.quotes("An amplifier delivering {} W into an {} Ω cabinet produces about {} V across the speaker terminals, about {} dBu");
    const speakerVolts = Math.sqrt(watts.value * ohms.value);
    expectQuoted(speakerVolts, volts);
    expectQuoted(voltsToDbu(speakerVolts), dbu);
  });

  it("les-di-stereo-keys: equal signals sum +6.02 dB; 1 ms offset → notches 500, 1500, 2500 Hz (comb filter, recordingology.com formula)", () => {
    const text = lesson("les-di-stereo-keys");
    expectQuoted(combExtremesDb({ amplitudeRatio: 1 }).peakDb, text.quote("adding them gives a signal twice the voltage, about {} dB louder"));
    expectQuoted(combExtremesDb({ amplitudeRatio: 1 }).peakDb, text.quote("Identical left and right sum about {} dB louder"));
    const [offsetMs, ...notches] = text.quotes("With a {} ms offset between the sides, the first notches fall at {} Hz, {} Hz and {} Hz");
    // τ = 1 ms ≡ Δd = 0.343 m at 343 m/s
    const notchesHz = combNotchesHz({ pathDifferenceM: (offsetMs.value / 1000) * SPEED_OF_SOUND_MS, speedOfSoundMs: SPEED_OF_SOUND_MS, count: notches.length });
    notches.forEach((notch, i) => expectQuoted(notchesHz[i], notch));
    // A full null for equal levels at the first notch
    expect(combResponseDb({ amplitudeRatio: 1, delayMs: offsetMs.value, frequencyHz: notches[0].value })).toBe(-Infinity);
  });
});
