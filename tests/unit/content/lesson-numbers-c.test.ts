import { describe, expect, it } from "vitest";
import { noiseDose, permissibleExposureHours, PHANTOM_SUPPLIES, phantomFaultCurrentMa, type ExposureStandard } from "@/lib/acoustics";
import { expectQuoted, loadLessons, type LessonQuotes } from "../../support/lesson-quotes";

// Every computed number quoted in the safe-stage-practice course, read from the lesson and checked
// against lib/acoustics (tests/support/lesson-quotes.ts). Where a lesson states the inputs (levels,
// times), they are read from it too. Full citations: tests/sources.md.
// - NIOSH 98-126: REL 85 dBA for 8 h, 3 dB exchange rate; T = 8 / 2^((L − 85)/3) h;
//   dose D = 100·Σ C/T %, TWA = 10·log10(D/100) + 85.
// - 29 CFR 1910.95, Table G-16 and App. A (Table G-16a and its formulas): PEL 90 dBA for 8 h,
//   5 dB exchange rate; T = 8 / 2^((L − 90)/5) h; TWA = 16.61·log10(D/100) + 90.
// - IEC 61938:2018, 48 V phantom powering (through the Sound On Sound glossary "Phantom Power" and
//   Wikipedia "Phantom power"): 48 ± 4 V, 6.81 kΩ per leg, up to 10 mA.
// Lessons les-ssp-cable-runs, les-ssp-electrical-safety and les-ssp-stands-overhead quote no computed numbers.

const lessonText = await loadLessons();
const MINUTES_PER_HOUR = 60;

function hours(levelDba: number, standard: ExposureStandard): number {
  return permissibleExposureHours({ levelDba, standard });
}

/** Dose share of a single segment, in percent. */
function segmentDosePercent(levelDba: number, hoursSpent: number, standard: ExposureStandard): number {
  return noiseDose({ segments: [{ levelDba, hours: hoursSpent }], standard }).dosePercent;
}

/** Plan A as the lesson's summary states it: "Plan A (91, 94, 94 and 97 dBA for 30, 45, 45 and 75 min)". */
function planA(lesson: LessonQuotes) {
  const [l1, l2, l3, l4, t1, t2, t3, t4] = lesson.quotes("Plan A ({}, {}, {} and {} dBA for {}, {}, {} and {} min)").map((q) => q.value);
  return [
    { levelDba: l1, hours: t1 / MINUTES_PER_HOUR },
    { levelDba: l2, hours: t2 / MINUTES_PER_HOUR },
    { levelDba: l3, hours: t3 / MINUTES_PER_HOUR },
    { levelDba: l4, hours: t4 / MINUTES_PER_HOUR },
  ];
}

/** Plan B: quieter line check and soundcheck, and the lesson's assumed plug attenuation on the two sets. */
function planB(lesson: LessonQuotes) {
  const [a, b, c, d] = planA(lesson);
  const plugDb = lesson.value("give about {} dB at the ear");
  return [
    { levelDba: lesson.value("Line check at {} dBA."), hours: a.hours },
    { levelDba: lesson.value("Soundcheck at {} dBA."), hours: b.hours },
    { levelDba: c.levelDba - plugDb, hours: c.hours },
    { levelDba: d.levelDba - plugDb, hours: d.hours },
  ];
}

describe("lesson les-ssp-exposure-limits", () => {
  // Each row of the table: level | NIOSH REL allows | OSHA PEL allows.
  const ROWS = [
    { levelDba: 85, niosh: "h", osha: "h" },
    { levelDba: 88, niosh: "h", osha: "h" },
    { levelDba: 91, niosh: "h", osha: "h" },
    { levelDba: 94, niosh: "h", osha: "h" },
    { levelDba: 97, niosh: "min", osha: "h" },
    { levelDba: 100, niosh: "min", osha: "h" },
    { levelDba: 103, niosh: "min", osha: "h" },
  ] as const;

  it("the table of allowed times: NIOSH REL (98-126) and OSHA PEL (29 CFR 1910.95, Table G-16a formula)", () => {
    const lesson = lessonText("les-ssp-exposure-limits");
    for (const row of ROWS) {
      const [niosh, osha] = lesson.quotes(`${row.levelDba} dBA | {} ${row.niosh} | {} ${row.osha}`);
      const nioshAllowed = hours(row.levelDba, "niosh") * (row.niosh === "min" ? MINUTES_PER_HOUR : 1);
      expectQuoted(nioshAllowed, niosh);
      expectQuoted(hours(row.levelDba, "osha"), osha);
    }
    expectQuoted(hours(94, "niosh"), lesson.quote("94 dBA allows {} h"));
    expectQuoted(hours(100, "niosh") * MINUTES_PER_HOUR, lesson.quote("100 dBA only {} min"));
    lesson.says("At 100 dBA, NIOSH gives you a quarter of an hour");
    expect(hours(100, "niosh")).toBeCloseTo(1 / 4, 9);
  });

  it("the definitions: 85 dBA for 8 h with 3 dB (NIOSH), 90 dBA for 8 h with 5 dB (OSHA)", () => {
    const lesson = lessonText("les-ssp-exposure-limits");
    const [nioshLevel, nioshHours, nioshExchange] = lesson.quotes("It allows {} dBA for {} hours, with a {} dB exchange rate");
    expectQuoted(hours(nioshLevel.value, "niosh"), nioshHours);
    lesson.says("for every 3 dB louder, the allowed time halves");
    expect(hours(nioshLevel.value + nioshExchange.value, "niosh") / hours(nioshLevel.value, "niosh")).toBeCloseTo(1 / 2, 9);
    const [oshaLevel, oshaHours, oshaExchange] = lesson.quotes("(PEL) of {} dBA for {} hours with a {} dB exchange rate");
    expectQuoted(hours(oshaLevel.value, "osha"), oshaHours);
    expect(hours(oshaLevel.value + oshaExchange.value, "osha") / hours(oshaLevel.value, "osha")).toBeCloseTo(1 / 2, 9);
  });

  it("2 h at 94 dBA plus 6 h at 85 dBA: dose and TWA under each method", () => {
    const lesson = lessonText("les-ssp-exposure-limits");
    const [h1, l1, h2, l2] = lesson.quotes("Take a day with {} hours at {} dBA (soundcheck and a set) and {} hours at {} dBA").map((q) => q.value);
    const segments = [
      { levelDba: l1, hours: h1 },
      { levelDba: l2, hours: h2 },
    ];
    // NIOSH 98-126 dose and TWA formulas (derived: 275 %, 89.39 dBA)
    const niosh = noiseDose({ segments, standard: "niosh" });
    expectQuoted(niosh.dosePercent, lesson.quote("Under NIOSH that is 2 ÷ 1 plus 6 ÷ 8, a dose of {} %"));
    expectQuoted(niosh.twaDba, lesson.quote("the NIOSH TWA is {} dBA"));
    // 29 CFR 1910.95 App. A (derived: 2/4.595 + 6/16 = 81.03 %, TWA 88.48 dBA)
    const osha = noiseDose({ segments, standard: "osha" });
    expectQuoted(osha.dosePercent, lesson.quote("Under OSHA it is 2 ÷ 4.6 plus 6 ÷ 16, a dose of about {} %"));
    expectQuoted(osha.twaDba, lesson.quote("the OSHA TWA is {} dBA"));
    const [keyNiosh, keyOsha] = lesson.quotes("2 h at 94 dBA plus 6 h at 85 dBA is {} % under NIOSH but about {} % under OSHA");
    expectQuoted(niosh.dosePercent, keyNiosh);
    expectQuoted(osha.dosePercent, keyOsha);
  });

  it("3 dB doubles the sound energy; 10 dB multiplies it by ten (ITU-R V.574-5: 10·log10 of a power ratio)", () => {
    const lesson = lessonText("les-ssp-exposure-limits");
    expect(10 ** (lesson.value("Adding {} dB doubles the sound energy") / 10)).toBeCloseTo(2, 1);
    expect(10 ** (lesson.value("Adding {} dB multiplies it by ten") / 10)).toBeCloseTo(10, 9);
  });
});

describe("lesson les-ssp-hearing-protection", () => {
  it("allowed time at 94, 91 and 88 dBA (NIOSH 98-126)", () => {
    const lesson = lessonText("les-ssp-hearing-protection");
    for (const [level, noun] of [
      [94, "hour"],
      [91, "hours"],
      [88, "hours"],
    ] as const) {
      expectQuoted(hours(level, "niosh"), lesson.quote(`${level} dBA allows {} ${noun}`));
    }
    const [off2x, off4x] = lesson.quotes("Take {} dB off and you double the time; take {} dB off and you have four times as long").map((q) => q.value);
    expect(hours(94 - off2x, "niosh") / hours(94, "niosh")).toBeCloseTo(2, 9);
    expect(hours(94 - off4x, "niosh") / hours(94, "niosh")).toBeCloseTo(4, 9);
  });

  it("a 45-minute soundcheck at 94 and at 88 dBA (NIOSH dose formula: 0.75/1 = 75 %, 0.75/4 = 18.75 %)", () => {
    const lesson = lessonText("les-ssp-hearing-protection");
    const soundcheckHours = lesson.value("A {}-minute soundcheck at 94 dBA") / MINUTES_PER_HOUR;
    expectQuoted(segmentDosePercent(94, soundcheckHours, "niosh"), lesson.quote("soundcheck at 94 dBA uses {} % of your daily NIOSH dose"));
    expectQuoted(segmentDosePercent(88, soundcheckHours, "niosh"), lesson.quote("The same soundcheck at 88 dBA uses about {} %"));
    const [summary94, summary88] = lesson.quotes("a 45-minute soundcheck at 94 dBA uses {} % of the day, at 88 dBA about {} %");
    expectQuoted(segmentDosePercent(94, soundcheckHours, "niosh"), summary94);
    expectQuoted(segmentDosePercent(88, soundcheckHours, "niosh"), summary88);
  });
});

describe("lesson les-ssp-show-day-dose", () => {
  it("Plan A's table is the plan the summary states", () => {
    const lesson = lessonText("les-ssp-show-day-dose");
    const plan = planA(lesson);
    const rows = ["Line check", "Soundcheck", "Support act", "The Tideline Four"];
    rows.forEach((name, i) => {
      const [minutes, level] = lesson.quotes(`${name} | {} min | {} dBA`);
      expectQuoted(plan[i].hours * MINUTES_PER_HOUR, minutes);
      expectQuoted(plan[i].levelDba, level);
    });
  });

  it("NIOSH allowances used in Plan A (NIOSH 98-126)", () => {
    const lesson = lessonText("les-ssp-show-day-dose");
    expectQuoted(hours(91, "niosh"), lesson.quote("91 dBA allows {} hours"));
    expectQuoted(hours(94, "niosh"), lesson.quote("94 dBA allows {} hour"));
    expectQuoted(hours(97, "niosh") * MINUTES_PER_HOUR, lesson.quote("97 dBA allows {} minutes"));
  });

  it("Plan A segment shares and total under NIOSH (NIOSH 98-126 dose and TWA formulas)", () => {
    const lesson = lessonText("les-ssp-show-day-dose");
    const plan = planA(lesson);
    const [lineCheck, soundcheck, support, headline] = lesson.quotes(
      "The line check uses {} %, the soundcheck {} %, the support act another {} % and the headline set {} %",
    );
    [lineCheck, soundcheck, support, headline].forEach((share, i) => expectQuoted(segmentDosePercent(plan[i].levelDba, plan[i].hours, "niosh"), share));
    expectQuoted(noiseDose({ segments: plan.slice(0, 2), standard: "niosh" }).dosePercent, lesson.quote("the line check and soundcheck together come to {} %"));
    const total = noiseDose({ segments: plan, standard: "niosh" });
    expectQuoted(total.dosePercent, lesson.quote("The total dose is {} %"));
    expectQuoted(total.twaDba, lesson.quote("and the NIOSH TWA is {} dBA"));
    const [summaryDose, summaryTwa] = lesson.quotes("reaches {} % under NIOSH, TWA {} dBA");
    expectQuoted(total.dosePercent, summaryDose);
    expectQuoted(total.twaDba, summaryTwa);
    lesson.says("The same day is more than four times the recommended limit");
    expect(total.dosePercent / 100).toBeGreaterThan(4);
    const loudHours = plan.reduce((sum, segment) => sum + segment.hours, 0);
    expectQuoted(loudHours, lesson.quote("the loud part of the day was only {} hours long"));
  });

  it("Plan A under OSHA (29 CFR 1910.95 App. A: 81.06 %, TWA 88.49 dBA)", () => {
    const lesson = lessonText("les-ssp-show-day-dose");
    const osha = noiseDose({ segments: planA(lesson), standard: "osha" });
    expectQuoted(osha.dosePercent, lesson.quote("through the OSHA method and the dose is about {} %, below the permissible limit"));
    expectQuoted(osha.twaDba, lesson.quote("with an OSHA TWA of {} dBA"));
    expectQuoted(osha.dosePercent, lesson.quote("but only about {} % under OSHA"));
  });

  it("Plan B with quieter checks and the lesson's assumed 12 dB of plug attenuation (NIOSH 98-126)", () => {
    const lesson = lessonText("les-ssp-show-day-dose");
    const plan = planB(lesson);
    const [support, headline] = lesson.quotes("so 94 dBA in the room becomes about {} dBA at the ear, and 97 dBA becomes about {} dBA");
    expectQuoted(plan[2].levelDba, support);
    expectQuoted(plan[3].levelDba, headline);
    const shares = lesson.quotes("The segments now come to {} % for the line check, {} % for the soundcheck, {} % for the support act and {} % for the headline set");
    shares.forEach((share, i) => expectQuoted(segmentDosePercent(plan[i].levelDba, plan[i].hours, "niosh"), share));
    const total = noiseDose({ segments: plan, standard: "niosh" });
    const [dose, twa] = lesson.quotes("a total NIOSH dose of about {} %, with a TWA of {} dBA");
    expectQuoted(total.dosePercent, dose);
    expectQuoted(total.twaDba, twa);
    const [summaryDose, summaryTwa] = lesson.quotes("brought the same day to about {} %, TWA {} dBA");
    expectQuoted(total.dosePercent, summaryDose);
    expectQuoted(total.twaDba, summaryTwa);
  });
});

describe("lesson les-ssp-phantom-cautions", () => {
  const p48 = PHANTOM_SUPPLIES.P48;

  it("the 48-volt variant's supply, feed resistors and current (IEC 61938:2018)", () => {
    const lesson = lessonText("les-ssp-phantom-cautions");
    const [supply, tolerance, low, high, resistorKOhm, current] = lesson.quotes(
      "a supply of {} V with a tolerance of ±{} V, so anywhere from {} V to {} V, fed through {} kΩ resistors (6.8 kΩ in practice) to each leg, for microphones that draw up to {} mA",
    );
    expectQuoted(p48.nominalV, supply);
    expectQuoted(p48.toleranceV, tolerance);
    expectQuoted(p48.nominalV - p48.toleranceV, low);
    expectQuoted(p48.nominalV + p48.toleranceV, high);
    expectQuoted(p48.feedResistorPerLegOhms / 1000, resistorKOhm);
    expectQuoted(p48.maxCurrentMa, current);
    const [summaryLow, summaryHigh, summaryR, summaryI] = lesson.quotes("the 48-volt variant is {} to {} V through {} kΩ per leg, for up to {} mA");
    expectQuoted(p48.nominalV - p48.toleranceV, summaryLow);
    expectQuoted(p48.nominalV + p48.toleranceV, summaryHigh);
    expectQuoted(p48.feedResistorPerLegOhms / 1000, summaryR);
    expectQuoted(p48.maxCurrentMa, summaryI);
  });

  it("current with one leg tied to ground: I = V/R = 48 V / 6.81 kΩ = 7.05 mA (IEC 61938 feed network, derived)", () => {
    const lesson = lessonText("les-ssp-phantom-cautions");
    expectQuoted(phantomFaultCurrentMa({ supply: "P48", fault: "one-leg" }), lesson.quote("About {} mA of DC can then flow"));
    expectQuoted(phantomFaultCurrentMa({ supply: "P48", fault: "one-leg" }), lesson.quote("one leg to ground lets about {} mA flow"));
  });
});

describe("lesson les-ssp-lantern-room-load-in", () => {
  it("the dose plan carried into the show day is Plan B of les-ssp-show-day-dose (NIOSH 98-126)", () => {
    const planLesson = lessonText("les-ssp-show-day-dose");
    const lesson = lessonText("les-ssp-lantern-room-load-in");
    expectQuoted(planB(planLesson)[1].levelDba, lesson.quote("a soundcheck at about {} dBA with drums checked one at a time"));
    const dose = noiseDose({ segments: planB(planLesson), standard: "niosh" }).dosePercent;
    expectQuoted(dose, lesson.quote("On paper that plan came to about {} % of the NIOSH daily dose"));
  });
});
