// Totals of an analytic rubric (each criterion scored at one of its levels; the total is the sum
// of the chosen levels' points, the maximum the sum of each criterion's best level). Pure and
// client-safe: the review page shows the same total the server stores, and the server never takes
// a total from the browser, only the chosen levels.

export type RubricShape = readonly { id: string; levels: readonly { points: number }[] }[];
/** Criterion id → the points of the chosen level. */
export type RubricScores = Readonly<Record<string, number>>;

export type RubricTotal = {
  total: number;
  max: number;
  /** Criteria with a level chosen, and how many there are. */
  scored: number;
  criteria: number;
  complete: boolean;
};

/** The highest total the rubric allows. */
export function rubricMax(rubric: RubricShape): number {
  return rubric.reduce((sum, c) => sum + Math.max(...c.levels.map((l) => l.points)), 0);
}

/** What is wrong with a set of scores for this rubric: unknown criteria, or points that are not one of a criterion's levels. */
export function scoreProblems(rubric: RubricShape, scores: RubricScores): string[] {
  const problems: string[] = [];
  const byId = new Map(rubric.map((c) => [c.id, c]));
  for (const [id, points] of Object.entries(scores)) {
    const criterion = byId.get(id);
    if (!criterion) problems.push(`"${id}" is not a criterion of this rubric`);
    else if (!criterion.levels.some((l) => l.points === points)) problems.push(`${points} is not a level of "${id}" (${criterion.levels.map((l) => l.points).join(", ")})`);
  }
  return problems;
}

/** The total of the scores given (criteria not yet scored count 0), out of the rubric's maximum. Scores must pass scoreProblems first. */
export function rubricTotal(rubric: RubricShape, scores: RubricScores): RubricTotal {
  let total = 0;
  let scored = 0;
  for (const c of rubric) {
    const points = scores[c.id];
    if (points === undefined) continue;
    total += points;
    scored += 1;
  }
  return { total, max: rubricMax(rubric), scored, criteria: rubric.length, complete: scored === rubric.length };
}
