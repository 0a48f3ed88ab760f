// The safety rules of the content check, for one lesson (lesson-checks.ts calls them).
// Pure: the valid topics come in as a set, so this file depends on no schema or registry.
//
// 1. Every caution or danger <Callout> names its hazard with a `hazard` prop: one safety topic, or
//    several separated by commas (hazard="stands-overhead, cable-runs"), each one a known topic and
//    one of the lesson's frontmatter `safety` tags. An explicit prop rather than a guess from the
//    words: a callout about a boom "over the kit" is not about hearing because it says "kit".
// 2. Every `safety` tag of the lesson has at least one caution or danger callout naming it.
// 3. Every caution or danger callout defers to someone outside the lesson: it names at least one
//    phrase of DEFERRAL_PHRASES.
import { lineOf, plainText, stringAttribute, type MdNode } from "./mdast";

export type DeferralPhrase = {
  /** What the phrase defers to, as the problem message says it. */
  name: string;
  pattern: RegExp;
  /** Only for callouts whose every hazard is one of these topics; absent: for every topic. */
  onlyFor?: readonly string[];
};

const APOSTROPHE = "['’]";

/**
 * The words a caution or danger callout may use to hand the final word to someone else.
 * Why these: a lesson cannot know the reader's country, venue or equipment, so a safety callout
 * must say whose rule wins where the reader works: the law there (local codes, regulations, fire
 * and electrical codes), the venue (its rules, policy, instructions, or the responsible person or
 * duty manager who speaks for them), the employer's hearing-conservation or manual-handling rules,
 * and people licensed or authorised for the work (a qualified or licensed electrician, competent
 * and authorised riggers, a qualified hearing professional). The maker's instructions count only
 * where the hazard is to or from the equipment itself and the maker sets the limit (phantom power
 * into a device, the wind rating of a stand); for mains, hearing or loads over people they are
 * not enough on their own.
 */
export const DEFERRAL_PHRASES: readonly DeferralPhrase[] = [
  { name: "local codes or regulations", pattern: /\blocal (?:[a-z-]+ ){0,2}(?:codes?|regulations?|rules|laws?)\b/i },
  { name: "the law where you work", pattern: /\bthe law where you work\b/i },
  {
    name: "the venue's rules",
    pattern: new RegExp(`\\b(?:venue|house)(?:${APOSTROPHE}s)?(?: and (?:your |the )?employer${APOSTROPHE}s)?(?: [a-z-]+){0,2} (?:rules|policy|policies|instructions|agreement)\\b`, "i"),
  },
  { name: "the venue's responsible person", pattern: new RegExp(`\\bvenue${APOSTROPHE}s (?:responsible person|duty manager)\\b`, "i") },
  { name: "the employer's rules", pattern: new RegExp(`\\bemployer${APOSTROPHE}s (?:[a-z-]+ ){0,2}(?:rules|training|policy|programme)\\b`, "i") },
  {
    name: "licensed or qualified practice",
    pattern: /\b(?:licensed|qualified),? (?:and (?:authorised|licensed) )?(?:electrician|professional|person|people|practice)\b|\bqualified and authorised\b|\bcompetent,? (?:and )?authorised people\b/i,
  },
  {
    name: "the maker's instructions",
    pattern: new RegExp(`\\b(?:makers?${APOSTROPHE}s?|manufacturers?${APOSTROPHE}s?) (?:[a-z-]+ ){0,2}(?:instructions|documentation|wind limits|ratings?)\\b`, "i"),
    onlyFor: ["phantom-power", "outdoor-weather"],
  },
];

export type SafetyProblem = { line: number; message: string };

const HAZARD_KINDS = new Set(["caution", "danger"]);

/** The topics a `hazard="a, b"` prop names, trimmed, empty entries dropped. */
export function hazardsOf(node: MdNode): string[] {
  return (stringAttribute(node, "hazard") ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
}

/** The deferral phrases a callout's text uses, given its hazards (a phrase limited to some topics counts only when every hazard is one of them). */
export function deferralsIn(text: string, hazards: readonly string[]): string[] {
  const flat = text.replace(/\s+/g, " ");
  return DEFERRAL_PHRASES.filter((p) => p.pattern.test(flat) && (!p.onlyFor || (hazards.length > 0 && hazards.every((h) => p.onlyFor!.includes(h))))).map((p) => p.name);
}

/** The safety rules for one lesson: its `safety` tags and its <Callout> nodes (in document order). Lines are body lines (1-based). */
export function safetyProblems(safety: readonly string[], callouts: readonly MdNode[], topics: ReadonlySet<string>): SafetyProblem[] {
  const problems: SafetyProblem[] = [];
  const tags = new Set(safety);
  const covered = new Set<string>();
  for (const node of callouts) {
    const kind = stringAttribute(node, "kind") ?? "";
    const hazards = hazardsOf(node);
    const line = lineOf(node) || 1;
    const title = stringAttribute(node, "title");
    const label = `<Callout kind="${kind}"${title ? ` title="${title}"` : ""}>`;
    if (!HAZARD_KINDS.has(kind)) {
      if (stringAttribute(node, "hazard") !== undefined) problems.push({ line, message: `${label}: only a caution or danger callout names a hazard` });
      continue;
    }
    if (hazards.length === 0) {
      problems.push({ line, message: `${label} needs hazard="<topic>" naming one of the lesson's safety tags (${safety.join(", ") || "none yet"})` });
    }
    for (const hazard of hazards) {
      if (!topics.has(hazard)) problems.push({ line, message: `${label}: hazard "${hazard}" is not a safety topic (${[...topics].join(", ")})` });
      else if (!tags.has(hazard)) problems.push({ line, message: `${label}: hazard "${hazard}" is not in the lesson's safety tags; add it to the frontmatter or change the hazard` });
      covered.add(hazard);
    }
    if (deferralsIn(plainText(node), hazards).length === 0) {
      problems.push({
        line,
        message: `${label} does not defer to local codes, venue rules or licensed practice: name one of ${DEFERRAL_PHRASES.map((p) => p.name + (p.onlyFor ? ` (only for ${p.onlyFor.join(", ")})` : "")).join("; ")}`,
      });
    }
  }
  for (const tag of safety) {
    if (!covered.has(tag)) problems.push({ line: 1, message: `safety tag "${tag}" has no caution or danger <Callout hazard="${tag}">` });
  }
  return problems;
}
