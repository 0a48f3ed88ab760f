// Client-safe DTOs of placement briefs, submissions and reviews (lib/server/briefs.ts and
// reviews.ts return them; the uploader, the pin editor and the pages read them).

export type SubmissionStatus = "submitted" | "redo_requested" | "approved";
/** Where an apprentice stands on a brief: nothing sent yet, or the status of the latest attempt. */
export type BriefState = "not_started" | SubmissionStatus;
export type ReviewDecision = "approve" | "redo";

export const SUBMISSION_STATUS_WORDS: Record<SubmissionStatus, string> = {
  submitted: "Waiting for review",
  redo_requested: "Redo requested",
  approved: "Approved",
};
export const BRIEF_STATE_WORDS: Record<BriefState, string> = { not_started: "Not started", ...SUBMISSION_STATUS_WORDS };

/** Limits every layer agrees on (zod on the server, maxLength in the forms). */
export const PLACEMENT_LIMITS = { captionChars: 300, commentChars: 2000, pinCommentChars: 500, maxPins: 30 } as const;

/** A pin on a photo: x and y are fractions (0…1) of the photo's width and height from its top left. */
export type PinDto = { id: string; photoId: string; x: number; y: number; comment: string };

export type RubricLevelDto = { points: number; label: string; descriptor: string };
export type RubricCriterionDto = { id: string; title: string; levels: RubricLevelDto[] };

export type PhotoDto = { id: string; uploadId: string; caption: string; position: number; width: number; height: number; displayUrl: string; thumbUrl: string };

export type ReviewDto = {
  state: "draft" | "final";
  scores: Record<string, number>;
  pins: PinDto[];
  decision: ReviewDecision | null;
  comment: string;
  totalPoints: number | null;
  maxPoints: number;
  version: number;
  updatedAt: string;
  reviewerName: string;
};

export type AttemptDto = {
  submissionId: string;
  attempt: number;
  status: SubmissionStatus;
  submittedAt: string;
  reviewedAt: string | null;
  photos: PhotoDto[];
  /** Apprentices see only a final review; the instructor's page also shows their draft. */
  review: ReviewDto | null;
};

export type BriefSummaryDto = {
  briefId: string;
  title: string;
  summary: string;
  lessonId: string;
  lessonTitle: string;
  state: BriefState;
  attempts: number;
};

export type BriefContentDto = {
  id: string;
  title: string;
  courseSlug: string;
  courseTitle: string;
  lessonId: string;
  lessonTitle: string;
  summary: string;
  setting: string;
  task: string[];
  photos: { min: number; max: number; shots: { title: string; angle: string }[]; measure: string };
  rubric: RubricCriterionDto[];
  maxPoints: number;
  safety: { hazard: string; text: string }[];
};

export type BriefDetailDto = {
  brief: BriefContentDto;
  state: BriefState;
  /** The class whose instructors review it; null when the apprentice is in no class on the course. */
  className: string | null;
  canSubmit: boolean;
  /** Newest first. */
  attempts: AttemptDto[];
};

export type QueueItemDto = {
  submissionId: string;
  briefId: string;
  briefTitle: string;
  apprenticeName: string;
  classId: string;
  className: string;
  attempt: number;
  status: SubmissionStatus;
  submittedAt: string;
  reviewedAt: string | null;
  /** Seconds since it was submitted (until it was reviewed). */
  waitedSeconds: number;
  hasDraft: boolean;
};

export type ReviewQueueDto = {
  items: QueueItemDto[];
  /** Per status, over the viewer's classes with the class and brief filters applied. */
  counts: Record<SubmissionStatus, number>;
  /** How long the oldest submission still waiting has waited, in seconds (null: none waiting). */
  oldestWaitingSeconds: number | null;
  filters: { classId: string | null; briefId: string | null; status: SubmissionStatus | "all" };
  classes: { id: string; name: string }[];
  briefs: { id: string; title: string }[];
};

export type ReviewViewDto = {
  submission: { id: string; attempt: number; status: SubmissionStatus; submittedAt: string; reviewedAt: string | null; apprenticeName: string; className: string };
  brief: BriefContentDto;
  photos: PhotoDto[];
  review: ReviewDto | null;
  /** The apprentice's earlier attempts at this brief, newest first, with their final reviews. */
  earlier: AttemptDto[];
};

/** "3 h 20 min", "2 days 4 h", "45 s": a wait in words. */
export function waitedWords(seconds: number): string {
  const s = Math.max(0, Math.round(seconds));
  if (s < 60) return `${s} s`;
  const minutes = Math.floor(s / 60);
  if (minutes < 60) return `${minutes} min`;
  const hours = Math.floor(minutes / 60);
  if (hours < 48) return `${hours} h ${minutes % 60} min`;
  return `${Math.floor(hours / 24)} days ${hours % 24} h`;
}

/** What saving a review answers: its new version and the total computed on the server. */
export type SavedReviewDto = { version: number; totalPoints: number; maxPoints: number; scored: number; criteria: number; savedAt: string };
export type ReviewInput = { submissionId: string; version: number; scores: Record<string, number>; pins: PinDto[]; comment: string };
export type ReviewAnswer = { ok: true; review: SavedReviewDto } | { ok: false; code: string; message: string };
