"use client";
// The instructor's review of one submission: pins on the photos (pin-board.tsx), a comment per
// pin, the rubric scored level by level with the total (the same pure function the server uses;
// the server's figure replaces it on every save), the overall comment, autosave of the draft, and
// the decision. Autosave waits for a pause in typing and sends the version it last saw, so a
// second instructor's newer draft is never overwritten silently.
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Textarea } from "@/components/ui/textarea";
import { rubricTotal } from "@/lib/assessment/rubric";
import { PLACEMENT_LIMITS, type PinDto, type ReviewAnswer, type ReviewInput, type ReviewViewDto } from "@/lib/dto/placements";
import { PinBoard } from "./pin-board";
import { RubricScorer } from "./rubric-scorer";

const AUTOSAVE_MS = 800;

export type ReviewActions = {
  saveDraft: (input: ReviewInput) => Promise<ReviewAnswer>;
  finalize: (input: ReviewInput & { decision: "approve" | "redo" }) => Promise<ReviewAnswer>;
};

export function ReviewEditor({ view, actions }: { view: ReviewViewDto; actions: ReviewActions }) {
  const router = useRouter();
  const initial = view.review;
  const [scores, setScores] = useState<Record<string, number>>(initial?.scores ?? {});
  const [pins, setPins] = useState<PinDto[]>(initial?.pins ?? []);
  const [comment, setComment] = useState(initial?.comment ?? "");
  const [saved, setSaved] = useState<string>(initial ? "Draft saved." : "Nothing saved yet.");
  const [problem, setProblem] = useState<string | null>(null);
  const [deciding, setDeciding] = useState<"approve" | "redo" | null>(null);
  const version = useRef(initial?.version ?? 0);
  const dirty = useRef(false);
  const commentRefs = useRef(new Map<string, HTMLTextAreaElement | null>());
  const [focusPin, setFocusPin] = useState<string | null>(null);

  const numberOf = (pin: PinDto) => pins.indexOf(pin) + 1;
  const totals = rubricTotal(view.brief.rubric, scores);
  // Pins still waiting for their comment stay in the browser until they have one.
  const input = (): ReviewInput => ({ submissionId: view.submission.id, version: version.current, scores, pins: pins.filter((p) => p.comment.trim() !== ""), comment });

  useEffect(() => {
    if (!dirty.current) return;
    const timer = setTimeout(async () => {
      setSaved("Saving…");
      const r = await actions.saveDraft(input());
      if (r.ok) {
        version.current = r.review.version;
        setSaved(`Draft saved at ${r.review.savedAt.slice(11, 19)} UTC.`);
        setProblem(null);
      } else {
        setSaved("Not saved.");
        setProblem(r.message);
      }
    }, AUTOSAVE_MS);
    return () => clearTimeout(timer);
    // input() reads these; the effect re-runs on each change to them.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [scores, pins, comment]);

  useEffect(() => {
    if (focusPin) commentRefs.current.get(focusPin)?.focus();
  }, [focusPin, pins]);

  const change = <T,>(set: (v: T) => void) => (v: T) => {
    dirty.current = true;
    set(v);
  };

  function drop(photoId: string, x: number, y: number) {
    if (pins.length >= PLACEMENT_LIMITS.maxPins) return setProblem(`At most ${PLACEMENT_LIMITS.maxPins} pins.`);
    const pin = { id: `p${crypto.randomUUID().slice(0, 8)}`, photoId, x, y, comment: "" };
    change(setPins)([...pins, pin]);
    setFocusPin(pin.id);
  }

  async function decide(decision: "approve" | "redo") {
    if (pins.some((p) => p.comment.trim() === "")) return setProblem("Write a comment for each pin, or remove the pin.");
    setDeciding(decision);
    const r = await actions.finalize({ ...input(), decision });
    setDeciding(null);
    if (!r.ok) return setProblem(r.message);
    router.refresh();
  }

  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="photos-heading" className="flex flex-col gap-4">
        <h2 id="photos-heading" className="text-xl font-semibold">
          Photos and pins
        </h2>
        {view.photos.map((photo, i) => (
          <PinBoard key={photo.id} photo={photo} index={i} pins={pins.filter((p) => p.photoId === photo.id)} numberOf={numberOf} onDrop={(x, y) => drop(photo.id, x, y)} onSelect={(p) => setFocusPin(p.id)} />
        ))}
        {pins.length > 0 && (
          <ol className="flex flex-col gap-3" aria-label="Pinned comments">
            {pins.map((pin) => (
              <li key={pin.id} className="flex flex-col gap-1.5 rounded-card border border-rule bg-surface-raised p-3">
                <label className="flex flex-col gap-1 text-body-sm font-semibold">
                  Comment for pin {numberOf(pin)} (photo {view.photos.findIndex((p) => p.id === pin.photoId) + 1}, {Math.round(pin.x * 100)}% across, {Math.round(pin.y * 100)}% down)
                  <Textarea
                    ref={(el) => {
                      commentRefs.current.set(pin.id, el);
                    }}
                    rows={2}
                    maxLength={PLACEMENT_LIMITS.pinCommentChars}
                    value={pin.comment}
                    onChange={(e) => change(setPins)(pins.map((p) => (p.id === pin.id ? { ...p, comment: e.currentTarget.value } : p)))}
                  />
                </label>
                <Button type="button" size="sm" variant="ghost" className="self-start" onClick={() => change(setPins)(pins.filter((p) => p.id !== pin.id))}>
                  Remove pin {numberOf(pin)}
                </Button>
              </li>
            ))}
          </ol>
        )}
      </section>
      <RubricScorer rubric={view.brief.rubric} scores={scores} onScore={(id, points) => change(setScores)({ ...scores, [id]: points })} totals={totals} />
      <section aria-labelledby="decision-heading" className="flex flex-col gap-3">
        <h2 id="decision-heading" className="text-xl font-semibold">
          Comment and decision
        </h2>
        <label className="flex flex-col gap-1 font-semibold">
          Comment for the apprentice (required for a redo: say what to change)
          <Textarea rows={4} maxLength={PLACEMENT_LIMITS.commentChars} value={comment} onChange={(e) => change(setComment)(e.currentTarget.value)} />
        </label>
        <p className="text-body-sm text-ink-muted" role="status">
          {saved}
        </p>
        {problem && (
          <Notice tone="danger" announce>
            {problem}
          </Notice>
        )}
        <div className="flex flex-wrap gap-3">
          <Button type="button" onClick={() => void decide("approve")} loading={deciding === "approve"} disabled={!totals.complete || deciding !== null}>
            Approve
          </Button>
          <Button type="button" variant="secondary" onClick={() => void decide("redo")} loading={deciding === "redo"} disabled={!totals.complete || deciding !== null}>
            Ask for a redo
          </Button>
        </div>
        {!totals.complete && <p className="text-body-sm text-ink-muted">Score every criterion to decide.</p>}
      </section>
    </div>
  );
}
