// The messages about placement briefs: the instructors' digest of new work to review (one per
// instructor per digest run, lib/jobs/review-digest.ts) and the apprentice's review result.
// Rendered through the shared layout of templates.ts.
import { layout, type RenderedMail } from "./templates";

export type ReviewDigestItem = { apprentice: string; briefTitle: string; className: string; attempt: number };

export type PlacementMailTemplate =
  | { template: "review_digest"; name: string; items: ReviewDigestItem[]; url: string }
  | { template: "review_result"; name: string; briefTitle: string; approved: boolean; total: number; max: number; comment: string; pinCount: number; url: string };

function itemLine(i: ReviewDigestItem): string {
  return `${i.apprentice}: ${i.briefTitle} (${i.className}${i.attempt > 1 ? `, attempt ${i.attempt}` : ""})`;
}

export function renderPlacementMail(m: PlacementMailTemplate): RenderedMail {
  switch (m.template) {
    case "review_digest": {
      const count = m.items.length === 1 ? "1 new submission" : `${m.items.length} new submissions`;
      const lines = m.items.map(itemLine);
      return {
        subject: `Placement photos to review: ${count}`,
        text: `Hello ${m.name},\n\n${count} arrived in your review queue since the last summary:\n\n${lines.map((l) => `- ${l}`).join("\n")}\n\nOpen the queue: ${m.url}\n`,
        html: layout("Placement photos to review", [`Hello ${m.name},`, `${count} arrived in your review queue since the last summary:`, ...lines], { label: "Open the review queue", url: m.url }),
      };
    }
    case "review_result": {
      const verdict = m.approved ? "approved" : "needs another attempt";
      const pins = m.pinCount === 0 ? "" : m.pinCount === 1 ? " There is 1 comment pinned on your photos." : ` There are ${m.pinCount} comments pinned on your photos.`;
      const summary = `Your submission for "${m.briefTitle}" ${verdict}: ${m.total} of ${m.max} points.${pins}`;
      const next = m.approved ? "It now counts toward your course." : "Read what to change, set it up again, and send new photos.";
      const comment = m.comment ? `Your instructor wrote: ${m.comment}` : "";
      return {
        subject: m.approved ? `Approved: ${m.briefTitle}` : `Redo requested: ${m.briefTitle}`,
        text: `Hello ${m.name},\n\n${summary}\n\n${comment ? `${comment}\n\n` : ""}${next}\n\n${m.url}\n`,
        html: layout(m.approved ? "Placement approved" : "Placement: redo requested", [`Hello ${m.name},`, summary, ...(comment ? [comment] : []), next], { label: "Open the brief", url: m.url }),
      };
    }
  }
}
