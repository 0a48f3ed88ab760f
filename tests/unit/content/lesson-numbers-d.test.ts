import { describe, expect, it } from "vitest";
import {
  celsiusToKelvin,
  dbfsToDbu,
  dbuToDbfs,
  delayMs,
  fullScaleDbu,
  gainStageLevels,
  inverseSquareChangeDb,
  micOutputDbu,
  micOutputVolts,
  noiseDose,
  noiseFigureDb,
  patternFigures,
  patternLevelDb,
  permissibleExposureHours,
  PICKUP_PATTERNS,
  quantisationSnrDb,
  speedOfSoundMs,
  thermalNoiseDbu,
  thermalNoiseVolts,
  type AlignmentId,
} from "@/lib/acoustics";
import { expectQuoted, loadLessons } from "../../support/lesson-quotes";

// Every computed number quoted in the stage-box-to-mix course, read from the lesson and checked
// against lib/acoustics (tests/support/lesson-quotes.ts). Where a lesson states the inputs
// (distances, temperatures, levels), they are read from it too. Full citations: tests/sources.md.
// - Inverse-square law, ΔL = −20·log10(r₂/r₁) (Ballou, Handbook for Sound Engineers, 4th ed., ch. 34).
// - Speed of sound in dry air, c = 331.3·√(1 + θ/273.15) m/s (Wikipedia "Speed of sound": 343.2 m/s at 20 °C).
// - Mic output V = S·p, p = 20 µPa·10^(L/20) (ISO 1683:2015); dBu re √0.6 V (ITU-R V.574-5).
// - EBU R68-2000: 0 dBu = −18 dBFS, full scale +18 dBu. SMPTE RP 155: reference −20 dBFS, paired with
//   +4 dBu by common practice, full scale +24 dBu.
// - Ideal N-bit quantisation SNR 6.02·N + 1.76 dB (Wikipedia "Audio bit depth": 16 bits ≈ 98 dB, 24 ≈ 146 dB).
// - Johnson (1928) and Nyquist (1928): v = √(4kTRB), k = 1.380649e−23 J/K (BIPM SI Brochure, 9th ed.);
//   150 Ω over 20 kHz at 290 K → −130.96 dBu (the trade's "−131 dBu", common practice). Noise figure =
//   EIN − source thermal noise (IEEE convention, T₀ = 290 K, from memory).
// - Headroom = clip − level; signal-to-noise = level − noise (common practice, Ballou on gain structure).
// - First-order patterns: Eargle, The Microphone Book, ch. 5–6; the exact supercardioid, Heller 2011
//   (nulls 125.26°, −11.44 dB straight behind).
// - NIOSH 98-126: 85 dBA for 8 h, 3 dB exchange rate; dose D = 100·Σ C/T %.
// - Half-split fault finding: each check halves the links still in doubt, so n links take ⌈log2 n⌉
//   checks; checked in turn from one end, up to n − 1 (the last is then known) (common practice).
// Lessons les-sbm-channel-input and les-sbm-eq-dynamics-sends quote no computed numbers.

const lessonText = await loadLessons();

describe("lesson les-sbm-groups-matrix-meters", () => {
  const lesson = lessonText("les-sbm-groups-matrix-meters");

  it("the bar is about 12 dB down on the front of the audience (inverse-square law, Ballou ch. 34)", () => {
    const barM = lesson.value("The bar is about {} m from the main loudspeakers");
    const frontM = lesson.value("the front of the audience is about {} m from them");
    expectQuoted(-inverseSquareChangeDb({ fromM: frontM, toM: barM }), lesson.quote("In the free field that is a drop of about {} dB"));
    const [takeawayFrom, takeawayTo, takeawayDrop] = lesson.quotes("Moving from {} m to {} m from the loudspeakers costs about {} dB in the free field");
    expectQuoted(-inverseSquareChangeDb({ fromM: takeawayFrom.value, toM: takeawayTo.value }), takeawayDrop);
  });

  it("a fill 12 m from the mains needs about 35 ms of delay at 20 °C (speed of sound, Wikipedia 'Speed of sound')", () => {
    const distanceM = lesson.value("The bar speaker stands about {} m from the main loudspeakers");
    const temperatureC = lesson.value("to cover that distance in air at {} °C");
    const speed = speedOfSoundMs({ temperatureC });
    expectQuoted(delayMs({ distanceM, speedOfSoundMs: speed }), lesson.quote("sound takes about {} ms to cover that distance"));
    const [fillM, fillMs] = lesson.quotes("a fill {} m away needs about {} ms of delay");
    expectQuoted(delayMs({ distanceM: fillM.value, speedOfSoundMs: speed }), fillMs);
  });
});

const EBU: AlignmentId = "ebu-r68";
const SMPTE: AlignmentId = "smpte-rp155";
/** EIN conditions: a 150 Ω source over 20 kHz at 290 K (common practice; IEEE T₀). */
const EIN_SOURCE = { resistanceOhms: 150, bandwidthHz: 20_000, temperatureK: 290 };
const KHZ = 1000;
const UV_PER_V = 1e6;

describe("lesson les-sbm-mic-to-line", () => {
  const lesson = lessonText("les-sbm-mic-to-line");
  const mvPerPa = lesson.value("Maren's cardioid dynamic makes about {} mV/Pa");
  const [avgSpl, avgMv, avgDbu] = lesson.quotes("When she sings at an average of {} dB SPL at the grille, it delivers about {} mV, a level of about {} dBu");
  const [peakSpl, rise, peakDbu] = lesson.quotes("In her loudest chorus the level at the grille reaches {} dB SPL, and the microphone's output rises by the same {} dB, to about {} dBu");

  it("Maren's voice at mic level (ISO 1683, ITU-R V.574-5)", () => {
    expectQuoted(1000 * micOutputVolts({ mvPerPa, splDb: avgSpl.value }), avgMv);
    expectQuoted(micOutputDbu({ mvPerPa, splDb: avgSpl.value }), avgDbu);
    expectQuoted(peakSpl.value - avgSpl.value, rise);
    expectQuoted(micOutputDbu({ mvPerPa, splDb: peakSpl.value }), peakDbu);
    const [sumMv, sumSpl, sumDbu, sumPeakSpl, sumPeakDbu] = lesson.quotes("{} mV/Pa at {} dB SPL is about {} dBu; at {} dB SPL it is about {} dBu");
    expectQuoted(micOutputDbu({ mvPerPa: sumMv.value, splDb: sumSpl.value }), sumDbu);
    expectQuoted(micOutputDbu({ mvPerPa: sumMv.value, splDb: sumPeakSpl.value }), sumPeakDbu);
  });

  it("trims of 52 and 46 dB against an EBU R68 full scale of +18 dBu", () => {
    expectQuoted(fullScaleDbu({ alignment: EBU }), lesson.quote("reach full scale at {} dBu"));
    const peak = micOutputDbu({ mvPerPa, splDb: peakSpl.value });
    const average = micOutputDbu({ mvPerPa, splDb: avgSpl.value });
    const [hotGain, hotPeak] = lesson.quotes("at {} dB of gain. In the first loud chorus the peaks reached about {} dBFS");
    expectQuoted(dbuToDbfs({ dbu: peak + hotGain.value, alignment: EBU }), hotPeak);
    const [gain, chorusDbfs, headroom] = lesson.quotes("With the trim at {} dB, the chorus peaks sit at about {} dBFS, leaving about {} dB of headroom");
    expectQuoted(dbuToDbfs({ dbu: peak + gain.value, alignment: EBU }), chorusDbfs);
    // headroom to the converter's full scale (common practice: clip − level)
    const chain = gainStageLevels({ sourceDbu: peak, stages: [{ name: "preamp and converter", gainDb: gain.value, clipDbu: fullScaleDbu({ alignment: EBU }) }] });
    expectQuoted(chain.minimumHeadroomDb, headroom);
    expectQuoted(dbuToDbfs({ dbu: average + gain.value, alignment: EBU }), lesson.quote("the average verse level lands at about {} dBFS"));
    const [sumGain, sumDbfs, sumFullScale] = lesson.quotes("{} dB puts Maren's chorus peaks at about {} dBFS on a console whose full scale is {} dBu");
    expectQuoted(dbuToDbfs({ dbu: peak + sumGain.value, alignment: EBU }), sumDbfs);
    expectQuoted(fullScaleDbu({ alignment: EBU }), sumFullScale);
  });

  it("the overhead needs about 22 dB of gain for the same peak, 24 dB less than the vocal", () => {
    const vocalGain = lesson.value("With the trim at {} dB, the chorus");
    const vocalPeakDbu = micOutputDbu({ mvPerPa, splDb: peakSpl.value }) + vocalGain;
    const [ohMv, ohSpl, ohDbu, ohGain, ohDbfs] = lesson.quotes(
      "makes about {} mV/Pa, five times more than the vocal microphone, and the cymbals peak around {} dB SPL at its capsule. That is about {} dBu at the microphone's output, so about {} dB of gain brings its peaks to the same {} dBFS",
    );
    expect(ohMv.value / mvPerPa).toBe(5);
    const ohSource = micOutputDbu({ mvPerPa: ohMv.value, splDb: ohSpl.value });
    expectQuoted(ohSource, ohDbu);
    const neededGain = vocalPeakDbu - ohSource;
    expectQuoted(neededGain, ohGain);
    expectQuoted(dbuToDbfs({ dbu: vocalPeakDbu, alignment: EBU }), ohDbfs);
    expectQuoted(vocalGain - neededGain, lesson.quote("The two channels of one band sit {} dB apart on their trims"));
    const [sumMv, sumGain] = lesson.quotes("A {} mV/Pa overhead needs about {} dB of gain for the same peak level");
    expectQuoted(vocalPeakDbu - micOutputDbu({ mvPerPa: sumMv.value, splDb: ohSpl.value }), sumGain);
  });
});

describe("lesson les-sbm-dbu-dbfs", () => {
  const lesson = lessonText("les-sbm-dbu-dbfs");

  it("the two alignments as published (EBU R68; SMPTE RP 155 with +4 dBu, common practice)", () => {
    const [ebuDbu, ebuDbfs, ebuFull] = lesson.quotes("{} dBu reads as {} dBFS. Full scale is then {} dBu");
    expectQuoted(dbuToDbfs({ dbu: ebuDbu.value, alignment: EBU }), ebuDbfs);
    expectQuoted(fullScaleDbu({ alignment: EBU }), ebuFull);
    const smpteReference = lesson.quote("sets a reference level of {} dBFS");
    const [smpteDbu, smpteFull] = lesson.quotes("matched to the professional line level of {} dBu. Full scale is then {} dBu");
    expectQuoted(dbuToDbfs({ dbu: smpteDbu.value, alignment: SMPTE }), smpteReference);
    expectQuoted(fullScaleDbu({ alignment: SMPTE }), smpteFull);
  });

  it("conversions both ways under each alignment", () => {
    const [line, lineEbu, lineAgain, lineSmpte] = lesson.quotes("Under EBU R 68 a professional line level of {} dBu reads {} dBFS; under SMPTE RP 155 the same {} dBu reads {} dBFS");
    expect(lineAgain.value).toBe(line.value);
    expectQuoted(dbuToDbfs({ dbu: line.value, alignment: EBU }), lineEbu);
    expectQuoted(dbuToDbfs({ dbu: line.value, alignment: SMPTE }), lineSmpte);
    const [reading, readingEbu, readingSmpte] = lesson.quotes("A meter reading of {} dBFS is {} dBu on an EBU-aligned device and {} dBu on a SMPTE-aligned one");
    expectQuoted(dbfsToDbu({ dbfs: reading.value, alignment: EBU }), readingEbu);
    expectQuoted(dbfsToDbu({ dbfs: reading.value, alignment: SMPTE }), readingSmpte);
    const [sumDbu, sumEbu, sumSmpte] = lesson.quotes("{} dBu is {} dBFS under EBU R 68 and {} dBFS under SMPTE RP 155");
    expectQuoted(dbuToDbfs({ dbu: sumDbu.value, alignment: EBU }), sumEbu);
    expectQuoted(dbuToDbfs({ dbu: sumDbu.value, alignment: SMPTE }), sumSmpte);
  });

  it("headroom above the reference: 18 dB (EBU R68), 20 dB (SMPTE RP 155 from +4 dBu)", () => {
    const [ebu, smpte, from, to] = lesson.quotes("{} dB for EBU R 68, {} dB for SMPTE RP 155 (from {} dBu up to {} dBu)");
    expectQuoted(fullScaleDbu({ alignment: EBU }) - dbfsToDbu({ dbfs: -18, alignment: EBU }), ebu);
    expectQuoted(fullScaleDbu({ alignment: SMPTE }) - from.value, smpte);
    expectQuoted(fullScaleDbu({ alignment: SMPTE }), to);
    const [sumEbu, sumSmpte] = lesson.quotes("The alignment's headroom is {} dB (EBU) or {} dB (SMPTE)");
    expectQuoted(fullScaleDbu({ alignment: EBU }) - 0, sumEbu);
    expectQuoted(fullScaleDbu({ alignment: SMPTE }) - 4, sumSmpte);
  });

  it("an EBU sender into a SMPTE recorder reads −6 dBFS at full scale; the reverse clips by 6 dB", () => {
    const [senderFull, recorderReads] = lesson.quotes("When the console's output reaches its own full scale, {} dBu, the recorder reads it as {} dBFS");
    expectQuoted(fullScaleDbu({ alignment: EBU }), senderFull);
    expectQuoted(dbuToDbfs({ dbu: senderFull.value, alignment: SMPTE }), recorderReads);
    const [smpteFull, over] = lesson.quotes("A signal at the sender's full scale, {} dBu, is {} dB above what the console can take");
    expectQuoted(fullScaleDbu({ alignment: SMPTE }), smpteFull);
    expectQuoted(dbuToDbfs({ dbu: smpteFull.value, alignment: EBU }), over);
    const [sumReads, sumOver] = lesson.quotes("An EBU-aligned sender's full scale reads {} dBFS on a SMPTE-aligned receiver; the other way round it clips the receiver by {} dB");
    expectQuoted(dbuToDbfs({ dbu: fullScaleDbu({ alignment: EBU }), alignment: SMPTE }), sumReads);
    expectQuoted(dbuToDbfs({ dbu: fullScaleDbu({ alignment: SMPTE }), alignment: EBU }), sumOver);
  });

  it("ideal converters: 24 bits about 146 dB, 16 bits about 98 dB (Wikipedia 'Audio bit depth')", () => {
    expectQuoted(quantisationSnrDb({ bits: 24 }), lesson.quote("An ideal 24-bit converter could in theory code a range of about {} dB"));
    expectQuoted(quantisationSnrDb({ bits: 16 }), lesson.quote("and an ideal 16-bit one about {} dB"));
  });
});

describe("lesson les-sbm-noise-pads", () => {
  const lesson = lessonText("les-sbm-noise-pads");

  it("the thermal noise of 150 Ω over 20 kHz at 290 K (Johnson 1928; Nyquist 1928)", () => {
    const [ohms, khz, kelvin, celsius, microvolts, dbu] = lesson.quotes(
      "A microphone with a source resistance of {} Ω, over a {} kHz audio bandwidth at {} K (about {} °C, the reference temperature for noise measurements), produces about {} µV of noise, a level of about {} dBu",
    );
    const args = { resistanceOhms: ohms.value, bandwidthHz: khz.value * KHZ, temperatureK: kelvin.value };
    expectQuoted(kelvin.value - celsiusToKelvin(0), celsius);
    expectQuoted(UV_PER_V * thermalNoiseVolts(args), microvolts);
    expectQuoted(thermalNoiseDbu(args), dbu);
    const [sOhms, sKhz, sK, sUv, sDbu] = lesson.quotes("{} Ω over {} kHz at {} K gives about {} µV, about {} dBu");
    const summary = { resistanceOhms: sOhms.value, bandwidthHz: sKhz.value * KHZ, temperatureK: sK.value };
    expectQuoted(UV_PER_V * thermalNoiseVolts(summary), sUv);
    expectQuoted(thermalNoiseDbu(summary), sDbu);
  });

  it("four times the resistance: +6 dB; half the bandwidth: −3 dB", () => {
    const [high, more, low] = lesson.quotes("a {} Ω source gives about {} dB more noise than a {} Ω one");
    expectQuoted(thermalNoiseDbu({ ...EIN_SOURCE, resistanceOhms: high.value }) - thermalNoiseDbu({ ...EIN_SOURCE, resistanceOhms: low.value }), more);
    expectQuoted(
      thermalNoiseDbu(EIN_SOURCE) - thermalNoiseDbu({ ...EIN_SOURCE, bandwidthHz: EIN_SOURCE.bandwidthHz / 2 }),
      lesson.quote("Halve the bandwidth and the noise falls by {} dB"),
    );
    const [sumMore, sumLess] = lesson.quotes("Four times the resistance gives about {} dB more noise; half the bandwidth, {} dB less");
    expectQuoted(thermalNoiseDbu({ ...EIN_SOURCE, resistanceOhms: 600 }) - thermalNoiseDbu(EIN_SOURCE), sumMore);
    expectQuoted(thermalNoiseDbu(EIN_SOURCE) - thermalNoiseDbu({ ...EIN_SOURCE, bandwidthHz: 10_000 }), sumLess);
  });

  it("noise figures of a −128 dBu and a −129.5 dBu preamp", () => {
    const [ein, figure] = lesson.quotes("specified at an EIN of {} dBu under those conditions. The difference from the floor, about {} dB");
    expectQuoted(noiseFigureDb({ einDbu: ein.value, ...EIN_SOURCE }), figure);
    const [best, bestFigure] = lesson.quotes("An excellent preamp might reach {} dBu, a noise figure of about {} dB");
    expectQuoted(noiseFigureDb({ einDbu: best.value, ...EIN_SOURCE }), bestFigure);
    const [sumEin, sumFigure] = lesson.quotes("EIN is measured with a 150 Ω source and includes its thermal noise: {} dBu is a noise figure of about {} dB");
    expectQuoted(noiseFigureDb({ einDbu: sumEin.value, ...EIN_SOURCE }), sumFigure);
  });

  it("Maren's voice against the EIN, with and without a 20 dB pad (signal-to-noise = level − noise)", () => {
    const voice = micOutputDbu({ mvPerPa: 2, splDb: 94 }); // as les-sbm-mic-to-line states it
    const [level, ein, snr] = lesson.quotes("her average singing level at the microphone is about {} dBu. Against an EIN of {} dBu that is a signal-to-noise ratio of about {} dB");
    expectQuoted(voice, level);
    expectQuoted(voice - ein.value, snr);
    const [pad, padded, paddedSnr, padEin, unpaddedSnr] = lesson.quotes("Put a {} dB pad on Maren's vocal and her average level falls to about {} dBu, only about {} dB above the {} dBu EIN instead of {} dB");
    expectQuoted(voice - pad.value, padded);
    expectQuoted(voice - pad.value - padEin.value, paddedSnr);
    expectQuoted(voice - padEin.value, unpaddedSnr);
    const [sumLevel, sumSnr, sumEin] = lesson.quotes("Maren's {} dBu average is about {} dB above a {} dBu EIN");
    expectQuoted(voice, sumLevel);
    expectQuoted(voice - sumEin.value, sumSnr);
  });

  it("a line-level receiver: over full scale at minimum gain, in range with the pad (EBU R68 full scale)", () => {
    const [peaks, minGain, reach, over, full] = lesson.quotes(
      "with peaks around {} dBu. If the house preamp cannot be turned down below about {} dB of gain, those peaks reach {} dBu, {} dB beyond the console's full scale of {} dBu",
    );
    const clipDbu = fullScaleDbu({ alignment: EBU });
    expectQuoted(clipDbu, full);
    const unpadded = gainStageLevels({ sourceDbu: peaks.value, stages: [{ name: "preamp", gainDb: minGain.value, clipDbu }] });
    expectQuoted(unpadded.stages[0].outputDbu, reach);
    expectQuoted(-unpadded.minimumHeadroomDb, over);
    expect(unpadded.firstClip).toBe("preamp");
    const [pad, after, afterDbfs] = lesson.quotes("With the {} dB pad in, the peaks arrive at about {} dBu after the preamp, {} dBFS");
    const padded = gainStageLevels({
      sourceDbu: peaks.value,
      stages: [
        { name: "pad", gainDb: -pad.value, clipDbu },
        { name: "preamp", gainDb: minGain.value, clipDbu },
      ],
    });
    expect(padded.firstClip).toBeNull();
    expectQuoted(padded.stages[1].outputDbu, after);
    expectQuoted(dbuToDbfs({ dbu: padded.stages[1].outputDbu, alignment: EBU }), afterDbfs);
  });
});

describe("lesson les-sbm-wedge-mixes", () => {
  const lesson = lessonText("les-sbm-wedge-mixes");
  const CARDIOID_A = PICKUP_PATTERNS.cardioid.a;
  const SUPERCARDIOID_A = PICKUP_PATTERNS.supercardioid.a;
  const dbDown = (a: number, angleDeg: number) => -patternLevelDb({ a, angleDeg });

  it("supercardioid nulls and rear lobe (Heller 2011: 125.26°, −11.44 dB); cardioid 30° off its null (Eargle ch. 5)", () => {
    const [nullDeg, rear] = lesson.quotes("its nulls sit about {}° off axis and its rear lobe is only about {} dB down straight behind");
    expectQuoted(patternFigures({ a: SUPERCARDIOID_A }).nullAnglesDeg[0], nullDeg);
    expectQuoted(dbDown(SUPERCARDIOID_A, 180), rear);
    const [offNull, angle, down] = lesson.quotes("even {}° away from it, at {}°, a cardioid is still about {} dB down");
    expectQuoted(180 - angle.value, offNull);
    expectQuoted(dbDown(CARDIOID_A, angle.value), down);
    expectQuoted(patternFigures({ a: SUPERCARDIOID_A }).nullAnglesDeg[0], lesson.quote("about {}° off axis for a supercardioid"));
    const [sumDown, sumAngle, sumRear] = lesson.quotes("A cardioid is still about {} dB down at {}°; a supercardioid only about {} dB down straight behind");
    expectQuoted(dbDown(CARDIOID_A, sumAngle.value), sumDown);
    expectQuoted(dbDown(SUPERCARDIOID_A, 180), sumRear);
  });

  it("each doubling of wedge-to-mic distance is worth about 6 dB (inverse-square law, Ballou ch. 34)", () => {
    expectQuoted(-inverseSquareChangeDb({ fromM: 1, toM: 2 }), lesson.quote("each doubling of the distance from wedge to microphone is worth about {} dB"));
  });
});

describe("lesson les-sbm-in-ears-talkback", () => {
  const lesson = lessonText("les-sbm-in-ears-talkback");

  it("NIOSH REL and the dose of a 75-minute set at 97 dBA (NIOSH 98-126)", () => {
    const [rel, relHours] = lesson.quotes("Under the NIOSH recommended limit, {} dBA for {} hours with a 3 dB exchange rate");
    expectQuoted(permissibleExposureHours({ levelDba: rel.value, standard: "niosh" }), relHours);
    lesson.says("94 dBA allows one hour");
    expect(permissibleExposureHours({ levelDba: 94, standard: "niosh" })).toBeCloseTo(1, 9);
    const [level, minutes] = lesson.quotes("and {} dBA only {} minutes");
    expectQuoted(60 * permissibleExposureHours({ levelDba: level.value, standard: "niosh" }), minutes);
    const [setLevel, setMinutes, dose] = lesson.quotes("averaged {} dBA through a {}-minute set, that set alone would be about {} % of the recommended daily dose");
    expectQuoted(noiseDose({ segments: [{ levelDba: setLevel.value, hours: setMinutes.value / 60 }], standard: "niosh" }).dosePercent, dose);
    const [sumLevel, sumMinutes, sumDose] = lesson.quotes("At {} dBA, a {}-minute set alone is about {} % of the NIOSH daily dose");
    expectQuoted(noiseDose({ segments: [{ levelDba: sumLevel.value, hours: sumMinutes.value / 60 }], standard: "niosh" }).dosePercent, sumDose);
  });
});

describe("lesson les-sbm-soundcheck-faults", () => {
  const lesson = lessonText("les-sbm-soundcheck-faults");
  /** Half-split: each check halves the links in doubt (common practice; ⌈log2 n⌉). */
  const halfSplitChecks = (links: number) => Math.ceil(Math.log2(links));
  /** One link at a time from one end: the last link is known once all the others have passed. */
  const endToEndChecks = (links: number) => links - 1;

  it("eight links: up to seven checks from one end, at most three by halves", () => {
    const links = lesson.value("The path from Maren's voice to her wedge has {} links");
    expectQuoted(endToEndChecks(links), lesson.quote("the fault can take up to {} checks to find"));
    const [again, checks] = lesson.quotes("so {} links take at most {} checks");
    expect(again.value).toBe(links);
    expectQuoted(halfSplitChecks(links), checks);
    const [sumLinks, sumChecks, sumEnd] = lesson.quotes("{} links take at most {} checks, against up to {} from one end");
    expectQuoted(halfSplitChecks(sumLinks.value), sumChecks);
    expectQuoted(endToEndChecks(sumLinks.value), sumEnd);
  });
});
