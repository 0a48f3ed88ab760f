// The rubric as radio groups, one per criterion (native radios in a fieldset: arrow keys move
// between levels), with the running total. Controlled by the review editor.
import type { RubricTotal } from "@/lib/assessment/rubric";
import type { RubricCriterionDto } from "@/lib/dto/placements";

export function RubricScorer({ rubric, scores, onScore, totals }: { rubric: RubricCriterionDto[]; scores: Record<string, number>; onScore: (id: string, points: number) => void; totals: RubricTotal }) {
  return (
    <section aria-labelledby="rubric-heading" className="flex flex-col gap-4">
      <h2 id="rubric-heading" className="text-xl font-semibold">
        Rubric
      </h2>
      {rubric.map((c) => (
        <fieldset key={c.id} className="flex flex-col gap-2">
          <legend className="mb-1 font-semibold">{c.title}</legend>
          {c.levels.map((l) => (
            <label key={l.points} className="flex items-start gap-3 text-body-sm">
              <input type="radio" name={`score-${c.id}`} value={l.points} checked={scores[c.id] === l.points} onChange={() => onScore(c.id, l.points)} className="mt-0.5 size-5 shrink-0 accent-accent" />
              <span>
                <span className="font-semibold">
                  {l.label}, {l.points} {l.points === 1 ? "point" : "points"}:
                </span>{" "}
                {l.descriptor}
              </span>
            </label>
          ))}
        </fieldset>
      ))}
      <p className="text-lg font-semibold" aria-live="polite" data-testid="rubric-total">
        Total: {totals.total} of {totals.max} points{totals.complete ? "" : ` (${totals.scored} of ${totals.criteria} criteria scored)`}
      </p>
    </section>
  );
}
