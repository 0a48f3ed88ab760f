// The Lantern Room scenario (content/scenario/lantern-room.json), parsed once. Pure and
// client-safe: the input-list table and the stage-plan diagram read it, and so do the tests that
// check lessons and question banks against it. Invalid data fails at import, so no build ships it.
import raw from "@/content/scenario/lantern-room.json";
import { scenarioSchema, type Scenario, type ScenarioInput, type StagePosition } from "./scenario-schema";

export type { Scenario, ScenarioInput, StagePosition } from "./scenario-schema";

export const SCENARIO: Scenario = scenarioSchema.parse(raw);

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
