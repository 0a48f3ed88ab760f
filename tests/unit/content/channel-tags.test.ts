// Every lesson passage and quiz item that speaks of a line of the Lantern Room input list is
// tagged with its channel and what it claims about it, and every claim is checked against the
// scenario data (content/scenario/lantern-room.json). Lessons tag with <Ch n="9" claims="…">;
// items are tagged in content/scenario/item-claims.json (the bank format is unchanged). A
// passage or item that names a channel number without a tag fails, so nothing escapes the check.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { questionBankSchema, type Question } from "@/lib/assessment/question-schema";
import { inputByChannel, stagePosition } from "@/lib/content/scenario";

const ROOT = process.cwd();
const CHANNEL_MENTION = /\b(?:ch|channels?)\s+\d+/gi;
const slug = (s: string) => s.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "");

/** Why a claim about a channel is false, or null when the data agrees. */
function claimProblem(channel: number, claim: string): string | null {
  const input = inputByChannel(channel);
  if (!input) return `no channel ${channel} on the input list`;
  const [key, value] = claim.split(":");
  const actual: Record<string, string | undefined> = {
    phantom: input.phantom ? "on" : "off",
    di: input.di?.type,
    transducer: input.transducer,
    pattern: input.pattern,
    side: stagePosition(input.position)?.side,
    is: slug(input.source),
  };
  if (!(key in actual)) return `unknown claim "${claim}" (use phantom, di, transducer, pattern, side or is)`;
  return actual[key] === value ? null : `channel ${channel} (${input.source}): claims ${key} ${value}, the input list says ${actual[key] ?? "none"}`;
}

function checkClaimList(channels: number[], claims: string[]): string[] {
  return channels.flatMap((channel) => claims.map((claim) => claimProblem(channel, claim)).filter((p): p is string => p !== null));
}

function lessonFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? lessonFiles(path.join(dir, e.name)) : e.name.endsWith(".mdx") ? [path.join(dir, e.name)] : []));
}

const TAG = /<Ch\s+n="([\d,\s]+)"\s+claims="([^"]*)">([\s\S]*?)<\/Ch>/g;

describe("lesson passages about input-list channels", () => {
  const lessons = lessonFiles(path.join(ROOT, "content/courses")).map((file) => ({ file: path.relative(ROOT, file), body: fs.readFileSync(file, "utf8") }));

  it("agree with the scenario data, claim by claim", () => {
    const problems: string[] = [];
    let tags = 0;
    for (const { file, body } of lessons) {
      for (const [, n, claims] of body.matchAll(TAG)) {
        tags += 1;
        const channels = n.split(",").map((c) => Number(c.trim()));
        for (const p of checkClaimList(channels, claims.split(/\s+/).filter(Boolean))) problems.push(`${file}: ${p}`);
      }
    }
    expect(tags).toBeGreaterThan(15);
    expect(problems).toEqual([]);
  });

  it("name a channel number only inside a <Ch> tag", () => {
    const untagged = lessons.flatMap(({ file, body }) => [...body.replace(TAG, " ").matchAll(CHANNEL_MENTION)].map((m) => `${file}: "${m[0]}"`));
    expect(untagged).toEqual([]);
  });

  it("the check itself catches a false claim", () => {
    expect(claimProblem(12, "di:active")).toMatch(/the input list says passive/);
    expect(claimProblem(9, "phantom:off")).toMatch(/says on/);
    expect(claimProblem(11, "side:stage-right")).toMatch(/says stage-left/);
    expect(claimProblem(3, "is:snare-top")).toMatch(/says snare-bottom/);
    expect(claimProblem(99, "phantom:on")).toMatch(/no channel 99/);
  });
});

describe("quiz items about input-list channels", () => {
  const claims = JSON.parse(fs.readFileSync(path.join(ROOT, "content/scenario/item-claims.json"), "utf8")) as Record<string, Record<string, string[]>>;
  const banksDir = path.join(ROOT, "content/banks");
  const banks = fs.readdirSync(banksDir).flatMap((course) =>
    fs.readdirSync(path.join(banksDir, course)).filter((n) => n.endsWith(".json")).map((n) => questionBankSchema.parse(JSON.parse(fs.readFileSync(path.join(banksDir, course, n), "utf8")))),
  );
  const words = (q: Question) => [q.prompt, ...("options" in q ? q.options : []), ...("items" in q ? q.items : []), ...("left" in q ? [...q.left, ...q.right] : [])].map((x) => (typeof x === "string" ? x : x.text)).join(" ");

  it("tag only items that exist", () => {
    const ids = new Map(banks.map((b) => [b.id, new Set(b.questions.map((q) => q.id))]));
    const missing = Object.entries(claims).flatMap(([bankId, items]) => Object.keys(items).filter((id) => !ids.get(bankId)?.has(id)).map((id) => `${bankId} ${id}`));
    expect(missing).toEqual([]);
  });

  it("agree with the scenario data, claim by claim", () => {
    const problems = Object.entries(claims).flatMap(([bankId, items]) =>
      Object.entries(items).flatMap(([id, lines]) =>
        lines.flatMap((line) => {
          const [channel, ...rest] = line.split(/\s+/);
          return checkClaimList([Number(channel)], rest).map((p) => `${bankId} ${id}: ${p}`);
        }),
      ),
    );
    expect(problems).toEqual([]);
  });

  it("name a channel number only when tagged", () => {
    const untagged = banks.flatMap((b) => b.questions.filter((q) => CHANNEL_MENTION.test(words(q)) && !claims[b.id]?.[q.id]).map((q) => `${b.id} ${q.id}`));
    expect(untagged).toEqual([]);
  });
});
