import { describe, it } from "vitest";
import { delayMs, inverseSquareChangeDb, speedOfSoundMs } from "@/lib/acoustics";
import { expectQuoted, loadLessons } from "../../support/lesson-quotes";

// Every computed number quoted in the stage-box-to-mix course, read from the lesson and checked
// against lib/acoustics (tests/support/lesson-quotes.ts). Where a lesson states the inputs
// (distances, temperatures, levels), they are read from it too. Full citations: tests/sources.md.
// - Inverse-square law, ΔL = −20·log10(r₂/r₁) (Ballou, Handbook for Sound Engineers, 4th ed., ch. 34).
// - Speed of sound in dry air, c = 331.3·√(1 + θ/273.15) m/s (Wikipedia "Speed of sound": 343.2 m/s at 20 °C).
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
