// The Lantern Room scenario (content/scenario/lantern-room.json). Pure and client-safe: the
// input-list table and the stage-plan diagram read it, and so do the tests that check lessons and
// question banks against it.
// The data is checked against scenarioSchema by `npm run content:check` and by
// tests/unit/content/scenario.test.ts, both part of `npm test`, rather than parsed here at import:
// the stage-plan diagram draws the quiz's hotspot questions, and a parse here put all of zod
// (41.5 KB gzipped) into the quiz page's scripts for data that never changes after the build.
import raw from "@/content/scenario/lantern-room.json";
import type { Scenario, ScenarioInput, StagePosition } from "./scenario-schema";

export type { Scenario, ScenarioInput, StagePosition } from "./scenario-schema";

export const SCENARIO = raw as Scenario;

/** Every line of the input list, piano-night lines included. */
export const ALL_INPUTS: readonly ScenarioInput[] = [...SCENARIO.inputs, ...SCENARIO.pianoNightInputs];

export function inputByChannel(channel: number): ScenarioInput | undefined {
  return ALL_INPUTS.find((input) => input.channel === channel);
}

export function stagePosition(id: string): StagePosition | undefined {
  return SCENARIO.stage.find((position) => position.id === id);
}

/** Channels with 48 V on, on an ordinary night (piano nights add the piano lines). */
export function phantomChannels(inputs: readonly ScenarioInput[] = SCENARIO.inputs): number[] {
  return inputs.filter((input) => input.phantom).map((input) => input.channel);
}

/** "stage left" / "stage right" / "centre stage", as the band faces the audience. */
export function sideWords(side: StagePosition["side"]): string {
  return side === "centre" ? "centre stage" : side.replace("-", " ");
}

/** What the input list's "Mic or DI" column shows for a line. */
export function micOrDi(input: ScenarioInput): string {
  return input.di ? `${input.di.type} DI` : (input.mic ?? "");
}
