// The Lantern Room scenario as data (content/scenario/lantern-room.json): its schema, the
// decisions it records, and the stage-plan diagram drawn from it.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { STAGE_PLAN_DIAGRAM, STAGE_PLAN_PARTS } from "@/components/diagrams/data/stage-plan";
import { ALL_INPUTS, SCENARIO, inputByChannel, phantomChannels, stagePosition } from "@/lib/content/scenario";
import { scenarioSchema } from "@/lib/content/scenario-schema";

const raw = JSON.parse(fs.readFileSync(path.join(process.cwd(), "content/scenario/lantern-room.json"), "utf8"));

describe("the scenario data", () => {
  it("parses, with channels numbered 1… without gaps", () => {
    expect(scenarioSchema.safeParse(raw).success).toBe(true);
    // SCENARIO is the file as read, not parsed (lib/content/scenario.ts): the parse must change nothing (no trimmed strings, no defaults).
    expect(SCENARIO).toEqual(scenarioSchema.parse(raw));
    expect(ALL_INPUTS.map((i) => i.channel)).toEqual(ALL_INPUTS.map((_, index) => index + 1));
  });

  it("records the decisions the courses follow", () => {
    expect(phantomChannels()).toEqual([4, 7, 8, 9]);
    expect(ALL_INPUTS.filter((i) => i.transducer === "condenser" && i.channel <= 18).map((i) => i.channel)).toEqual([4, 7, 8]);
    expect(inputByChannel(9)?.di).toMatchObject({ type: "active", needsPhantom: true });
    expect([inputByChannel(12)?.di?.type, inputByChannel(13)?.di?.type]).toEqual(["passive", "passive"]);
    expect(inputByChannel(2)?.pattern).toBe("cardioid");
    expect(inputByChannel(10)?.source).toBe("Bass cab");
    expect(SCENARIO.console.phantomSwitching).toBe("per-channel");
    expect(stagePosition("guitar-rig")?.side).toBe("stage-left");
    expect(stagePosition("bass-rig")?.side).toBe("stage-right");
  });

  it("refuses lines that contradict themselves", () => {
    const withInput = (change: (inputs: typeof raw.inputs) => void) => {
      const copy = structuredClone(raw);
      change(copy.inputs);
      return scenarioSchema.safeParse(copy).success;
    };
    expect(withInput((inputs) => (inputs[11].phantom = true))).toBe(false); // a passive DI with 48 V on
    expect(withInput((inputs) => (inputs[11].di.needsPhantom = true))).toBe(false); // a passive DI that "needs" phantom
    expect(withInput((inputs) => (inputs[3].phantom = false))).toBe(false); // a condenser without 48 V
    expect(withInput((inputs) => (inputs[0].phantom = true))).toBe(false); // a dynamic with 48 V
    expect(withInput((inputs) => inputs.splice(4, 1))).toBe(false); // a gap in the channel numbers
    expect(withInput((inputs) => (inputs[0].position = "balcony"))).toBe(false); // no such stage position
  });
});

describe("the stage plan drawn from the data", () => {
  const middle = STAGE_PLAN_DIAGRAM.viewBox.width / 2;
  const drawnSide = (x: number) => (x < middle ? "stage-right" : x > middle ? "stage-left" : "centre");

  it("puts each marked position on the side the data gives (stage right is the drawing's left)", () => {
    for (const position of STAGE_PLAN_DIAGRAM.positions) {
      expect(drawnSide(position.x), position.id).toBe(stagePosition(position.id)?.side);
    }
    expect(drawnSide((STAGE_PLAN_PARTS.guitarCab.left + STAGE_PLAN_PARTS.guitarCab.right) / 2)).toBe(stagePosition("guitar-rig")?.side);
    expect(drawnSide((STAGE_PLAN_PARTS.bassCab.left + STAGE_PLAN_PARTS.bassCab.right) / 2)).toBe(stagePosition("bass-rig")?.side);
  });

  it("says in words which side each rig stands", () => {
    expect(STAGE_PLAN_DIAGRAM.description).toContain("the guitar rig upstage, stage left (right of the drawing)");
    expect(STAGE_PLAN_DIAGRAM.description).toContain("the bass rig upstage, stage right (left of the drawing)");
  });
});

describe("the input-list lesson", () => {
  it("draws its table from the data, not from a table typed into the lesson", () => {
    const file = path.join(process.cwd(), "content/courses/miking-the-band/setup/02-input-list-and-stage-plot.mdx");
    const source = fs.readFileSync(file, "utf8");
    expect(source).toContain("<InputList />");
    expect(source).not.toMatch(/^\|\s*Ch\s*\|/m);
  });
});
