// The safety rules of the content check (lib/content/safety-checks.ts): hazard props against the
// lesson's safety tags, and the deferral wording of every caution or danger callout.
// Rule source: the project's safety rule (cautions defer to local codes, venue rules and licensed
// practice), common practice in the trade's safety guidance.
import { describe, expect, it } from "vitest";
import { parseLessonBody } from "@/lib/content/mdx-pipeline";
import type { MdNode } from "@/lib/content/mdast";
import { walk } from "@/lib/content/mdast";
import { deferralsIn, hazardsOf, safetyProblems } from "@/lib/content/safety-checks";
import { SAFETY_TOPICS } from "@/lib/content/schemas";

const topics = new Set<string>(SAFETY_TOPICS);

function calloutsOf(body: string): MdNode[] {
  const found: MdNode[] = [];
  walk(parseLessonBody(body) as MdNode, (node) => {
    if (node.name === "Callout") found.push(node);
  });
  return found;
}

const problems = (safety: string[], body: string) => safetyProblems(safety, calloutsOf(body), topics).map((p) => p.message);

describe("deferral phrases", () => {
  it("accept each way of handing the final word to someone outside the lesson", () => {
    const accepted: [string, string][] = [
      ["Follow your local electrical codes.", "local codes or regulations"],
      ["Local regulations decide who may do what.", "local codes or regulations"],
      ["Follow the hearing-conservation rules of the law where you work.", "the law where you work"],
      ["Follow the venue's rules.", "the venue's rules"],
      ["Follow the venue’s noise policy.", "the venue's rules"],
      ["Follow the venue's and your employer's hearing-conservation rules.", "the venue's rules"],
      ["Venue rules and local fire codes take priority.", "the venue's rules"],
      ["Only with the venue's agreement.", "the venue's rules"],
      ["Follow the house rules on stage.", "the venue's rules"],
      ["Tell the venue's responsible person.", "the venue's responsible person"],
      ["Ask the venue's duty manager first.", "the venue's responsible person"],
      ["Follow your employer's manual-handling training.", "the employer's rules"],
      ["Mains faults are for a qualified electrician.", "licensed or qualified practice"],
      ["That is work for a licensed electrician.", "licensed or qualified practice"],
      ["Unless you are qualified and authorised to do so.", "licensed or qualified practice"],
      ["That is rigging, for competent, authorised people.", "licensed or qualified practice"],
      ["Arrange hearing tests with a qualified professional.", "licensed or qualified practice"],
    ];
    for (const [text, phrase] of accepted) expect(deferralsIn(text, ["hearing"]), text).toContain(phrase);
  });

  it("refuse a callout that only tells the reader what to do", () => {
    for (const text of [
      "Protect your hearing and turn down before you switch.",
      "Never suspend anything over the kit from the venue's structure yourself.",
      "Weight the base if the venue allows.",
      "If ringing lasts, see a doctor or an audiologist.",
      "Not every design does; read the documentation.",
      "Keep cables out of the local bar's walkway.",
    ]) {
      expect(deferralsIn(text, ["hearing"]), text).toEqual([]);
    }
  });

  it("count the maker's instructions only where the maker sets the limit (phantom power, wind on stands)", () => {
    const text = "Follow the DI maker's instructions.";
    expect(deferralsIn(text, ["phantom-power"])).toEqual(["the maker's instructions"]);
    expect(deferralsIn("Follow the makers' stated wind limits for stands.", ["outdoor-weather"])).toEqual(["the maker's instructions"]);
    expect(deferralsIn(text, ["hearing"])).toEqual([]);
    // a callout about phantom and hearing needs a deferral that covers the ears too
    expect(deferralsIn(text, ["phantom-power", "hearing"])).toEqual([]);
    expect(deferralsIn(text, [])).toEqual([]);
  });
});

describe("hazard props and safety tags", () => {
  it("reads one or several comma-separated hazards", () => {
    const [one, two] = calloutsOf(`<Callout kind="caution" hazard="hearing">a</Callout>\n\n<Callout kind="danger" hazard=" stands-overhead, cable-runs ">b</Callout>\n`);
    expect(hazardsOf(one)).toEqual(["hearing"]);
    expect(hazardsOf(two)).toEqual(["stands-overhead", "cable-runs"]);
  });

  it("passes a lesson whose every tag has a deferring callout and every callout a tag", () => {
    const body = `<Callout kind="danger" hazard="hearing" title="Ears">Wear protection and follow the venue's noise policy.</Callout>\n\n<Callout kind="caution" hazard="stands-overhead, cable-runs">Tape the run and follow the venue's rules for exits.</Callout>\n\n<Callout kind="note">A note needs no hazard.</Callout>\n`;
    expect(problems(["hearing", "stands-overhead", "cable-runs"], body)).toEqual([]);
  });

  it("needs a hazard on every caution or danger callout", () => {
    const body = `<Callout kind="danger" title="Ears">Follow the venue's noise policy.</Callout>\n`;
    expect(problems(["hearing"], body)).toEqual([
      `<Callout kind="danger" title="Ears"> needs hazard="<topic>" naming one of the lesson's safety tags (hearing)`,
      `safety tag "hearing" has no caution or danger <Callout hazard="hearing">`,
    ]);
  });

  it("refuses a hazard that is not a topic, or not one of the lesson's tags", () => {
    const body = `<Callout kind="caution" hazard="ladders">Follow local regulations.</Callout>\n\n<Callout kind="caution" hazard="electrical">Mains faults are for a qualified electrician.</Callout>\n`;
    const messages = problems([], body);
    expect(messages).toContainEqual(expect.stringMatching(/^<Callout kind="caution">: hazard "ladders" is not a safety topic/));
    expect(messages).toContainEqual(`<Callout kind="caution">: hazard "electrical" is not in the lesson's safety tags; add it to the frontmatter or change the hazard`);
  });

  it("needs a callout for each tag, and a hazard only on caution or danger", () => {
    const body = `<Callout kind="caution" hazard="hearing">Follow the venue's noise policy.</Callout>\n\n<Callout kind="tip" hazard="hearing">Plugs help.</Callout>\n`;
    expect(problems(["hearing", "manual-handling"], body)).toEqual([
      `<Callout kind="tip">: only a caution or danger callout names a hazard`,
      `safety tag "manual-handling" has no caution or danger <Callout hazard="manual-handling">`,
    ]);
  });

  it("reports a callout that does not defer, on its line", () => {
    const body = `Some words.\n\n<Callout kind="danger" hazard="hearing" title="Sudden peaks">\nKeep masters down while patching.\n</Callout>\n`;
    const [problem] = safetyProblems(["hearing"], calloutsOf(body), topics);
    expect(problem.line).toBe(3);
    expect(problem.message).toMatch(/^<Callout kind="danger" title="Sudden peaks"> does not defer to local codes, venue rules or licensed practice: name one of local codes or regulations; /);
  });
});
