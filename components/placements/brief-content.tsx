// A placement brief as the apprentice and the instructor read it: the scene, the steps, the
// photos to take, the safety notes and the rubric with every level's points.
import { Notice } from "@/components/ui/notice";
import type { BriefContentDto } from "@/lib/dto/placements";

const HAZARD_WORDS: Record<string, string> = {
  hearing: "Hearing",
  electrical: "Electrical",
  "phantom-power": "Phantom power",
  "stands-overhead": "Stands and overhead loads",
  "cable-runs": "Cable runs",
  "manual-handling": "Manual handling",
  "work-at-height": "Work at height",
  "outdoor-weather": "Outdoor weather",
};

export function BriefRubric({ brief }: { brief: BriefContentDto }) {
  return (
    <section aria-labelledby="rubric" className="flex flex-col gap-3">
      <h2 id="rubric" className="text-xl font-semibold">
        Rubric <span className="text-body font-normal text-ink-muted">({brief.maxPoints} points)</span>
      </h2>
      <ul className="flex flex-col gap-3">
        {brief.rubric.map((c) => (
          <li key={c.id} className="flex flex-col gap-1">
            <h3 className="text-body font-semibold">{c.title}</h3>
            <ul className="flex flex-col gap-1 text-body-sm">
              {c.levels.map((l) => (
                <li key={l.points}>
                  <span className="font-semibold">
                    {l.label} ({l.points} {l.points === 1 ? "point" : "points"}):
                  </span>{" "}
                  {l.descriptor}
                </li>
              ))}
            </ul>
          </li>
        ))}
      </ul>
    </section>
  );
}

export function BriefContent({ brief }: { brief: BriefContentDto }) {
  return (
    <div className="flex flex-col gap-6">
      <p className="max-w-reading text-body">{brief.setting}</p>
      <section aria-labelledby="task" className="flex flex-col gap-2">
        <h2 id="task" className="text-xl font-semibold">
          Set it up
        </h2>
        <ol className="ml-5 flex max-w-reading list-decimal flex-col gap-1.5">
          {brief.task.map((step) => (
            <li key={step}>{step}</li>
          ))}
        </ol>
      </section>
      <section aria-labelledby="shots" className="flex flex-col gap-2">
        <h2 id="shots" className="text-xl font-semibold">
          Photos to take <span className="text-body font-normal text-ink-muted">({brief.photos.min === brief.photos.max ? brief.photos.min : `${brief.photos.min} to ${brief.photos.max}`})</span>
        </h2>
        <ul className="flex max-w-reading flex-col gap-1.5">
          {brief.photos.shots.map((s) => (
            <li key={s.title}>
              <span className="font-semibold">{s.title}:</span> {s.angle}
            </li>
          ))}
        </ul>
        <p className="max-w-reading text-body">
          <span className="font-semibold">In shot:</span> {brief.photos.measure}
        </p>
      </section>
      <section aria-labelledby="safety" className="flex flex-col gap-2">
        <h2 id="safety" className="text-xl font-semibold">
          Safety
        </h2>
        {brief.safety.map((n) => (
          <Notice key={n.hazard + n.text.slice(0, 20)} tone="caution" title={HAZARD_WORDS[n.hazard] ?? n.hazard}>
            {n.text}
          </Notice>
        ))}
      </section>
      <BriefRubric brief={brief} />
    </div>
  );
}
