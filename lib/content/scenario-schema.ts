// The invented scenario every course tells (PRODUCT.md's demo band, club and rig) as data:
// content/scenario/lantern-room.json, checked by this schema. Pure: safe to import anywhere.
// Lessons, question banks and the stage-plan diagram must agree with it; the content tests
// check every passage and item tagged with a channel against it.
import "@/lib/validation/zod-in-browser";
import { z } from "zod";

export const STAGE_SIDES = ["stage-left", "centre", "stage-right"] as const;
export const STAGE_DEPTHS = ["upstage", "centre", "downstage"] as const;
export const TRANSDUCERS = ["dynamic", "condenser", "ribbon", "di", "wireless"] as const;
export const PATTERNS = ["omni", "cardioid", "supercardioid", "hypercardioid", "figure-8", "half-cardioid"] as const;
export const DI_TYPES = ["active", "passive"] as const;

const text = z.string().trim().min(1);

export const stagePositionSchema = z.strictObject({
  id: z.string().regex(/^[a-z]+(?:-[a-z]+)*$/),
  label: text,
  /** Stage left and right as the band faces the audience. */
  side: z.enum(STAGE_SIDES),
  depth: z.enum(STAGE_DEPTHS),
});

const diSchema = z.strictObject({
  type: z.enum(DI_TYPES),
  /** Whether the box runs on phantom power (an active DI usually does; a passive one never needs it). */
  needsPhantom: z.boolean(),
  /** Where in the instrument's chain the DI takes its signal. */
  feed: text,
});

export const inputSchema = z
  .strictObject({
    channel: z.number().int().positive(),
    source: text,
    /** Stage-plan position id of the source. */
    position: text,
    transducer: z.enum(TRANSDUCERS),
    pattern: z.enum(PATTERNS).optional(),
    /** The microphone or receiver as the input list names it (generic, never a brand). */
    mic: text.optional(),
    di: diSchema.optional(),
    stand: text,
    /** 48 V switched on for this channel. */
    phantom: z.boolean(),
    insert: text.nullable(),
    notes: z.string(),
  })
  .superRefine((input, ctx) => {
    const issue = (message: string, path: string) => ctx.addIssue({ code: "custom", message, path: [path] });
    if (input.transducer === "di") {
      if (!input.di) issue("a DI channel says which DI (type, phantom, feed)", "di");
      if (input.mic) issue("a DI channel has no microphone", "mic");
      if (input.di?.type === "passive" && input.di.needsPhantom) issue("a passive DI never needs phantom power", "di");
      if (input.di && input.phantom !== input.di.needsPhantom) issue("48 V is on exactly when the DI needs it", "phantom");
    } else {
      if (input.di) issue("only a DI channel has a DI", "di");
      if (!input.mic) issue("name the microphone or receiver", "mic");
      // Condensers need phantom; dynamics, passive ribbons and receivers must not get it on this list.
      if (input.phantom !== (input.transducer === "condenser")) issue(`48 V must be ${input.transducer === "condenser" ? "on" : "off"} for a ${input.transducer}`, "phantom");
    }
    if ((input.transducer === "dynamic" || input.transducer === "condenser" || input.transducer === "ribbon") && !input.pattern) issue("a microphone states its pattern", "pattern");
  });

export const scenarioSchema = z
  .strictObject({
    band: z.strictObject({ name: text, members: z.array(z.strictObject({ name: text, plays: text })).min(1) }),
    venue: z.strictObject({ name: text, town: text }),
    console: z.strictObject({
      channels: z.number().int().positive(),
      /** How the house console switches 48 V: per channel, or in banks of `bankSize` channels. */
      phantomSwitching: z.enum(["per-channel", "banks"]),
      bankSize: z.number().int().positive().optional(),
      note: text,
    }),
    inputs: z.array(inputSchema).min(1),
    /** Extra lines added on nights when the house grand is used. */
    pianoNightInputs: z.array(inputSchema),
    stage: z.array(stagePositionSchema).min(1),
    equipment: z.array(z.strictObject({ item: text, count: z.number().int().positive(), note: z.string() })),
  })
  .superRefine((scenario, ctx) => {
    const all = [...scenario.inputs, ...scenario.pianoNightInputs];
    all.forEach((input, index) => {
      if (input.channel !== index + 1) ctx.addIssue({ code: "custom", message: `channels run 1, 2, 3… without gaps (found ${input.channel} at row ${index + 1})`, path: ["inputs", index, "channel"] });
    });
    if (all.length > scenario.console.channels) ctx.addIssue({ code: "custom", message: "more inputs than console channels", path: ["inputs"] });
    const ids = new Set(scenario.stage.map((p) => p.id));
    if (ids.size !== scenario.stage.length) ctx.addIssue({ code: "custom", message: "duplicate stage position id", path: ["stage"] });
    all.forEach((input) => {
      if (!ids.has(input.position)) ctx.addIssue({ code: "custom", message: `channel ${input.channel}: no stage position "${input.position}"`, path: ["inputs"] });
    });
    if ((scenario.console.phantomSwitching === "banks") !== (scenario.console.bankSize !== undefined)) {
      ctx.addIssue({ code: "custom", message: "bankSize is given exactly when phantom is switched in banks", path: ["console", "bankSize"] });
    }
  });

export type Scenario = z.infer<typeof scenarioSchema>;
export type ScenarioInput = z.infer<typeof inputSchema>;
export type StagePosition = z.infer<typeof stagePositionSchema>;
export type StageSide = (typeof STAGE_SIDES)[number];
