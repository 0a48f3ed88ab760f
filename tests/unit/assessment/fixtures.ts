/**
 * Questions for the assessment tests, in our invented scenario: Kestrel Bay Audio School's
 * spring class miking the house band at a fictional club, The Tidewater Room.
 */
import { createGeneratorRegistry, questionSchema, type AcousticsFunctions, type Question, type QuestionInput } from "@/lib/assessment";

export function parseQuestion(input: QuestionInput): Question {
  return questionSchema.parse(input);
}

export const singleQuestion = parseQuestion({
  kind: "single",
  id: "q-kick-pattern",
  topic: "pickup patterns",
  prompt: "The drummer's monitor wedge sits behind the kick mic. Which pattern puts its null toward the wedge?",
  explanation: "A cardioid's null is at 180°, straight behind the capsule.",
  options: [
    { id: "omni", text: "Omnidirectional" },
    { id: "cardioid", text: "Cardioid" },
    { id: "fig8", text: "Figure-8" },
  ],
  correctOptionId: "cardioid",
});

export const multipleQuestion = parseQuestion({
  kind: "multiple",
  id: "q-phantom-safe",
  topic: "phantom power",
  prompt: "Which habits protect gear when phantom power is in use? Tick all that apply.",
  explanation: "Mute the channel and switch phantom off before patching; never hot-patch.",
  options: [
    { id: "mute", text: "Mute the channel before patching" },
    { id: "off", text: "Switch phantom off before unplugging" },
    { id: "hot", text: "Hot-patch while the channel is up" },
    { id: "lift", text: "Remove the mains safety earth" },
  ],
  correctOptionIds: ["mute", "off"],
  points: 2,
});

export const numericQuestion = parseQuestion({
  kind: "numeric",
  id: "q-delay-distance",
  topic: "delay and time alignment",
  prompt: "Sound at 343 m/s travels to a delay tower 10 m away. How long does it take?",
  explanation: "t = d/c = 10 / 343 s = 29.15 ms.",
  answer: 29.15, // t = d/c: 10 m → 29.15 ms at c = 343.0 [derived]
  unit: "ms",
  tolerance: { type: "absolute", amount: 0.05 },
});

export const generatedQuestion = parseQuestion({
  kind: "generated",
  id: "q-comb-notch",
  topic: "comb filtering",
  prompt: "Two mics on the guitar cabinet differ in path by {pathDifferenceM} m at {temperatureC} °C. Where is the first notch?",
  explanation: "f₁ = c/(2Δd).",
  generator: "combFirstNotch",
  ranges: {
    pathDifferenceM: { min: 0.1, max: 1.5, step: 0.05 },
    temperatureC: { min: 10, max: 30, step: 1 },
  },
  tolerance: { type: "relative", percent: 2 },
});

export const orderingQuestion = parseQuestion({
  kind: "ordering",
  id: "q-order-of-work",
  topic: "order of work",
  prompt: "Put the stage set-up in the order of work.",
  explanation: "Stands first, then mics, cables, DIs, and the stage box patch last.",
  items: [
    { id: "stands", text: "Place the stands" },
    { id: "mics", text: "Mount the mics" },
    { id: "cables", text: "Run the cables" },
    { id: "dis", text: "Set the DIs" },
    { id: "box", text: "Patch the stage box" },
  ],
  correctOrder: ["stands", "mics", "cables", "dis", "box"],
});

export const matchingQuestion = parseQuestion({
  kind: "matching",
  id: "q-match-sources",
  topic: "miking the band",
  prompt: "Match each source in the band to a sensible first choice.",
  explanation: "Keys and bass usually go direct; the kick takes a rugged dynamic.",
  left: [
    { id: "kick", text: "Kick drum" },
    { id: "keys", text: "Stereo keyboard" },
    { id: "overheads", text: "Drum overheads" },
  ],
  right: [
    { id: "dynamic", text: "A rugged cardioid dynamic" },
    { id: "di", text: "Two active DIs" },
    { id: "sdc", text: "A pair of small-diaphragm condensers" },
    { id: "ribbon", text: "A figure-8 ribbon" },
  ],
  correctPairs: { kick: "dynamic", keys: "di", overheads: "sdc" },
});

export const hotspotQuestion = parseQuestion({
  kind: "hotspot",
  id: "q-null-on-plot",
  topic: "pickup patterns",
  prompt: "On the supercardioid polar plot, pick a null.",
  explanation: "A supercardioid's nulls sit near ±126°.",
  diagram: "polar-supercardioid",
  regions: [
    { id: "null-left", label: "Null, rear left", shape: { type: "circle", cx: 30, cy: 160, r: 12 } },
    { id: "null-right", label: "Null, rear right", shape: { type: "circle", cx: 170, cy: 160, r: 12 } },
    { id: "rear-lobe", label: "Rear lobe", shape: { type: "rect", x: 70, y: 150, w: 60, h: 40 } },
    { id: "front", label: "Front of the capsule", shape: { type: "rect", x: 0, y: 0, w: 200, h: 100 } },
  ],
  correctRegionIds: ["null-left", "null-right"],
});

export const allQuestions: Question[] = [
  singleQuestion,
  multipleQuestion,
  numericQuestion,
  generatedQuestion,
  orderingQuestion,
  matchingQuestion,
  hotspotQuestion,
];

/**
 * Stand-ins for lib/acoustics with the textbook formulas, so grading tests do not depend on
 * another module's rounding: c = 331.3·√(1 + T/273.15) (Wikipedia "Speed of sound"), f_n = (2n−1)c/(2Δd)
 * (§4), t = d/c (§11), ΔL = −20·log10(r2/r1) (§5), T = 8/2^((L − Lc)/q) (§10).
 */
export const stubAcoustics: AcousticsFunctions = {
  speedOfSoundMs: ({ temperatureC }) => 331.3 * Math.sqrt(1 + temperatureC / 273.15),
  combNotchesHz: ({ pathDifferenceM, speedOfSoundMs, count }) =>
    Array.from({ length: count }, (_, index) => ((2 * index + 1) * speedOfSoundMs) / (2 * pathDifferenceM)),
  delayMs: ({ distanceM, speedOfSoundMs }) => (1000 * distanceM) / speedOfSoundMs,
  inverseSquareChangeDb: ({ fromM, toM }) => -20 * Math.log10(toM / fromM),
  permissibleExposureHours: ({ levelDba, standard }) =>
    standard === "niosh" ? 8 / 2 ** ((levelDba - 85) / 3) : 8 / 2 ** ((levelDba - 90) / 5),
  // IEC 61938 P48: 6.81 kΩ per leg (SOS glossary, Wikipedia "Phantom power")
  phantomAtMic: ({ supplyV, currentMa }) => ({ voltsAtMic: supplyV - (currentMa / 1000) * (6810 / 2) }),
  phantomFaultCurrentMa: ({ supplyV, fault }) => ((fault === "one-leg" ? 1 : 2) * supplyV * 1000) / 6810,
  // 0 dBu = √0.6 V (ITU-R BS.645-2); SPL re 20 µPa (ISO 1683)
  dbuToVolts: (levelDbu) => Math.sqrt(0.6) * 10 ** (levelDbu / 20),
  micOutputVolts: ({ mvPerPa, splDb }) => (mvPerPa / 1000) * 20e-6 * 10 ** (splDb / 20),
  transformer: ({ turnsRatio }) => ({ voltageChangeDb: -20 * Math.log10(turnsRatio) }),
  // EBU R68: −18 dBFS = 0 dBu; SMPTE RP 155: −20 dBFS, paired with +4 dBu (common practice)
  dbfsToDbu: ({ dbfs, alignment }) => (alignment === "ebu-r68" ? dbfs + 18 : dbfs + 24),
  dbuToDbfs: ({ dbu, alignment }) => (alignment === "ebu-r68" ? dbu - 18 : dbu - 24),
  celsiusToKelvin: (temperatureC) => temperatureC + 273.15, // ISO 80000-5
  // Johnson–Nyquist, v = √(4kTRB), k = 1.380649e-23 J/K (2019 SI)
  thermalNoiseVolts: ({ resistanceOhms, bandwidthHz, temperatureK }) => Math.sqrt(4 * 1.380649e-23 * temperatureK * resistanceOhms * bandwidthHz),
  thermalNoiseDbu: ({ resistanceOhms, bandwidthHz, temperatureK }) =>
    20 * Math.log10(Math.sqrt(4 * 1.380649e-23 * temperatureK * resistanceOhms * bandwidthHz) / Math.sqrt(0.6)),
  noiseFigureDb: ({ einDbu, resistanceOhms, bandwidthHz }) => einDbu - 20 * Math.log10(Math.sqrt(4 * 1.380649e-23 * 290 * resistanceOhms * bandwidthHz) / Math.sqrt(0.6)),
  micOutputDbu: ({ mvPerPa, splDb }) => 20 * Math.log10(((mvPerPa / 1000) * 20e-6 * 10 ** (splDb / 20)) / Math.sqrt(0.6)),
  // headroom = clip − (source + gain), common practice
  gainStageLevels: ({ sourceDbu, stages }) => ({ stages: stages.map((stage) => ({ headroomDb: stage.clipDbu - sourceDbu - stage.gainDb })) }),
};

export const stubGenerators = createGeneratorRegistry(stubAcoustics);
